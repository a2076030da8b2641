import { describe, expect, it } from "vitest";
import { checkInputSize } from "../../../src/core/table/checkInputSize.ts";
import { maxInputBytes } from "../../../src/core/table/readOptions.ts";
import { createTableReader } from "../../../src/core/table/createTableReader.ts";

describe("checkInputSize", () => {
  it("accepts a file of exactly 1 GiB and refuses one byte more, naming the size", () => {
    expect(maxInputBytes).toBe(1_073_741_824); // 2^30
    expect(() => checkInputSize(maxInputBytes)).not.toThrow();
    expect(() => checkInputSize(maxInputBytes + 1)).toThrow("the file is too large: 1.00 GiB (the limit is 1 GiB)");
    expect(() => checkInputSize(2 ** 31)).toThrow("the file is too large: 2.00 GiB (the limit is 1 GiB)"); // JSDoc example
  });

  it("takes another limit: 2 GiB accepts 2^31 bytes and refuses one more, naming 2 GiB; Infinity (the headless command's) accepts 2^40", () => {
    expect(() => checkInputSize(2 ** 31, 2 ** 31)).not.toThrow();
    expect(() => checkInputSize(2 ** 31 + 1, 2 ** 31)).toThrow("the file is too large: 2.00 GiB (the limit is 2 GiB)"); // 2^31 / 2^30 = 2, worked by hand
    expect(() => checkInputSize(2 ** 40, Number.POSITIVE_INFINITY)).not.toThrow();
  });

  it("createTableReader counts characters against its limit: 12 characters pass a limit of 12, the 13th fails", () => {
    const reader = createTableReader({}, true, 12);
    reader.push("x,y\n1,2\n3,4\n"); // 12 characters
    expect(() => reader.push("5")).toThrow("the file is too large: more than 12 characters");
  });

  it("throws for a size that is not a number of bytes", () => {
    expect(() => checkInputSize(NaN)).toThrow("invalid file size: NaN");
  });
});
