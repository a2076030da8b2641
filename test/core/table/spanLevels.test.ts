import { describe, expect, it } from "vitest";
import { SpanLevels } from "../../../src/core/table/spanLevels.ts";

describe("SpanLevels", () => {
  it("finds north in a,north,b at code 0 (the @example)", () => {
    const levels = ["north"];
    const table = new SpanLevels(levels);
    table.add(0);
    expect(table.find("a,north,b", 2, 7)).toBe(0); // worked by hand
  });

  it("finds each of 5,000 levels from a span of a longer text, through several doublings, and nothing for texts it does not hold", () => {
    const levels: string[] = [];
    const table = new SpanLevels(levels);
    for (let k = 0; k < 5000; ++k) {
      levels.push(`L${(k * 7919) % 100_003}`);
      table.add(k);
    }
    for (let k = 0; k < 5000; ++k) {
      const text = `;;${levels[k]};`;
      expect(table.find(text, 2, text.length - 1)).toBe(k);
    }
    for (const missing of ["", "L", "L1x", "M0", "l0"]) expect(table.find(missing, 0, missing.length)).toBe(-1);
  });

  it("tells apart texts of the same length and of different lengths with a shared start", () => {
    const levels = ["ab", "ba", "abc", "é", "e"];
    const table = new SpanLevels(levels);
    levels.forEach((_, k) => table.add(k));
    const text = "ab|ba|abc|é|e|ab";
    expect([table.find(text, 0, 2), table.find(text, 3, 5), table.find(text, 6, 9), table.find(text, 10, 11), table.find(text, 12, 13), table.find(text, 6, 8)]).toEqual([0, 1, 2, 3, 4, 0]); // worked by hand
  });
});
