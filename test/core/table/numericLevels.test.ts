import { describe, expect, it } from "vitest";
import { missingCode } from "../../../src/core/table/finishColumn.ts";
import { maxNumericLevels, numericLevels } from "../../../src/core/table/numericLevels.ts";

describe("numericLevels", () => {
  it("levels of 2, 0, NaN, 2 are '0' and '2', codes 1, 0, missing, 1 (worked by hand; the JSDoc example)", () => {
    const categories = numericLevels(Float64Array.of(2, 0, NaN, 2))!;
    expect(categories.levels).toEqual(["0", "2"]);
    expect(Array.from(categories.codes)).toEqual([1, 0, missingCode, 1]);
  });

  it("12 distinct values are levels; 13 are not (the limit is 12)", () => {
    expect(maxNumericLevels).toBe(12);
    expect(numericLevels(Float64Array.from({ length: 24 }, (_, i) => i % 12))!.levels).toHaveLength(12);
    expect(numericLevels(Float64Array.from({ length: 13 }, (_, i) => i))).toBeNull();
  });

  it("levels are in ascending order and written in shortest form: 10, 2.5, -1 give '-1', '2.5', '10'", () => {
    expect(numericLevels(Float64Array.of(10, 2.5, -1))!.levels).toEqual(["-1", "2.5", "10"]);
  });

  it("a column with no present value has no levels", () => {
    expect(numericLevels(Float64Array.of(NaN, NaN))).toBeNull();
    expect(numericLevels(new Float64Array(0))).toBeNull();
  });
});
