import { describe, expect, it } from "vitest";
import { memoizeLast } from "../../src/state/memoizeLast.ts";

describe("memoizeLast", () => {
  it("returns the same object for the same arguments by identity, and recomputes for new ones", () => {
    let calls = 0;
    const pair = memoizeLast((a: object, b: number) => {
      calls++;
      return { a, b };
    });
    const key = {};
    const first = pair(key, 1);
    expect(pair(key, 1)).toBe(first);
    expect(calls).toBe(1);
    expect(pair({}, 1)).not.toBe(first);
    expect(pair(key, 2)).not.toBe(first);
    expect(calls).toBe(3);
  });

  it("treats NaN as the same argument as NaN (Object.is)", () => {
    let calls = 0;
    const f = memoizeLast((x: number) => ++calls + x);
    f(NaN);
    f(NaN);
    expect(calls).toBe(1);
  });
});
