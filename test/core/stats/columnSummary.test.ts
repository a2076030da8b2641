import { describe, expect, it } from "vitest";
import { columnSummary } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

describe("columnSummary", () => {
  it("summarises 4, NaN, 1, 3, 10: count 4, missing 1, mean 4.5, sd √15, quartiles 2.5 / 3.5 / 5.5, range 1..10", () => {
    // Present values sorted: 1, 3, 4, 10. Mean 18/4 = 4.5; deviations −3.5, −1.5, −0.5, 5.5 square to
    // 12.25 + 2.25 + 0.25 + 30.25 = 45, over n − 1 = 3 gives 15. Type 7: h = 3p, so
    // q1 = 1 + 0.75·(3 − 1) = 2.5, median = 3 + 0.5·(4 − 3) = 3.5, q3 = 4 + 0.25·(10 − 4) = 5.5.
    const column = Float64Array.of(4, NaN, 1, 3, 10); // typed arrays cannot be frozen; the last test checks the column is left as it was
    assertClose(columnSummary(column, Uint32Array.of(0, 1, 2, 3, 4)), {
      count: 4, // worked by hand
      missing: 1, // worked by hand
      mean: 4.5, // worked by hand
      sd: Math.sqrt(15), // worked by hand
      min: 1, // worked by hand
      q1: 2.5, // worked by hand
      median: 3.5, // worked by hand
      q3: 5.5, // worked by hand
      max: 10, // worked by hand
    });
  });

  it("the JSDoc example: the median of 4, NaN, 1, 3 is 3", () => {
    assertClose(columnSummary(Float64Array.of(4, NaN, 1, 3), Uint32Array.of(0, 1, 2, 3)).median, 3); // worked by hand: sorted 1, 3, 4; h = 1
  });

  it("only the listed rows count: rows 2 and 4 of 4, NaN, 1, 3, 10 give mean 5.5 and sd √40.5", () => {
    const summary = columnSummary(Float64Array.of(4, NaN, 1, 3, 10), [2, 4]);
    assertClose(summary.mean, 5.5); // worked by hand: (1 + 10) / 2
    assertClose(summary.sd, Math.sqrt(40.5)); // worked by hand: (4.5² + 4.5²) / 1 = 40.5
    assertClose(summary.median, 5.5); // worked by hand: h = 0.5
  });

  it("one value: every location statistic is that value and the sd is NaN", () => {
    assertClose(columnSummary(Float64Array.of(2, 9), [1]), {
      count: 1, missing: 0, mean: 9, sd: NaN, min: 9, q1: 9, median: 9, q3: 9, max: 9, // simple formula
    });
  });

  it("a constant column has sd 0 and every quartile equal to the constant", () => {
    const summary = columnSummary(new Float64Array(4).fill(-1.25), [0, 1, 2, 3]);
    assertClose(summary, { count: 4, missing: 0, mean: -1.25, sd: 0, min: -1.25, q1: -1.25, median: -1.25, q3: -1.25, max: -1.25 }, { absolute: 0 }); // simple formula
  });

  it("no rows, or only missing values, give NaN for every statistic", () => {
    const nothing = { mean: NaN, sd: NaN, min: NaN, q1: NaN, median: NaN, q3: NaN, max: NaN };
    assertClose(columnSummary(Float64Array.of(1, 2), []), { count: 0, missing: 0, ...nothing });
    assertClose(columnSummary(Float64Array.of(NaN, NaN, 5), [0, 1]), { count: 0, missing: 2, ...nothing });
  });

  it("does not reorder or change the column it reads", () => {
    const column = Float64Array.of(3, 1, 2);
    columnSummary(column, [0, 1, 2]);
    expect(Array.from(column)).toEqual([3, 1, 2]);
  });
});
