import { describe, expect, it } from "vitest";
import { checkInputSize } from "../../../src/core/table/checkInputSize.ts";
import { maxInputBytes } from "../../../src/core/table/readOptions.ts";

describe("checkInputSize", () => {
  it("accepts a file of exactly 1 GiB and refuses one byte more, naming the size", () => {
    expect(maxInputBytes).toBe(1_073_741_824); // 2^30
    expect(() => checkInputSize(maxInputBytes)).not.toThrow();
    expect(() => checkInputSize(maxInputBytes + 1)).toThrow("the file is too large: 1.00 GiB (the limit is 1 GiB)");
    expect(() => checkInputSize(2 ** 31)).toThrow("the file is too large: 2.00 GiB (the limit is 1 GiB)"); // JSDoc example
  });

  it("throws for a size that is not a number of bytes", () => {
    expect(() => checkInputSize(NaN)).toThrow("invalid file size: NaN");
  });
});
