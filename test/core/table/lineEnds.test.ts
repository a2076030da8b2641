import { describe, expect, it } from "vitest";
import { lineEnds } from "../../../src/core/table/lineEnds.ts";

describe("lineEnds", () => {
  it("drops a leading byte-order mark and turns \\r\\n and \\r into \\n (JSDoc example)", () => {
    expect(lineEnds().push("\ufeffa\r\nb\rc")).toBe("a\nb\nc");
  });

  it("a \\r at the end of a chunk waits: \\r | \\n makes one line end, \\r | x makes one too", () => {
    const ends = lineEnds();
    expect([ends.push("a\r"), ends.push("\nb\r"), ends.push("c"), ends.push("\r"), ends.flush()].join("")).toBe("a\nb\nc\n");
  });

  it("keeps a byte-order mark that is not at the very start", () => {
    const ends = lineEnds();
    expect(ends.push("x") + ends.push("\ufeff")).toBe("x\ufeff");
  });
});
