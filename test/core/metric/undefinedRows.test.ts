// Rows on which a metric is undefined, and the registry that hands metrics out by name.
import { describe, expect, it } from "vitest";
import { chebyshev, correlation, cosine, euclidean, manhattan, maybeMetric, metricNames, metrics } from "../../../src/core/index.ts";
import { rowsOf } from "../support/metricVectors.ts";

describe("isUndefinedRow", () => {
  it("cosine: the zero row (0, 0, 0) is undefined, and so is (0, −0, 0); (0, 0, 3) and (0, 1e-300) are not", () => {
    expect(cosine.isUndefinedRow!(rowsOf([0, 0, 0]), 3, 0)).toBe(true); // worked by hand: ‖x‖ = 0
    expect(cosine.isUndefinedRow!(rowsOf([0, -0, 0]), 3, 0)).toBe(true); // worked by hand: −0 = 0
    expect(cosine.isUndefinedRow!(rowsOf([0, 0, 3]), 3, 0)).toBe(false);
    expect(cosine.isUndefinedRow!(rowsOf([0, 1e-300]), 2, 0)).toBe(false);
  });

  it("cosine: reads row i only — row 1 of (1, 2), (0, 0), (3, 4) is undefined, rows 0 and 2 are not", () => {
    const values = rowsOf([1, 2], [0, 0], [3, 4]);
    expect([0, 1, 2].map((i) => cosine.isUndefinedRow!(values, 2, i))).toEqual([false, true, false]); // worked by hand
  });

  it("correlation: constant rows (2, 2, 2) and (0.1, 0.1, 0.1) are undefined; (2, 2, 3) is not", () => {
    expect(correlation.isUndefinedRow!(rowsOf([2, 2, 2]), 3, 0)).toBe(true); // worked by hand: zero spread
    expect(correlation.isUndefinedRow!(rowsOf([0.1, 0.1, 0.1]), 3, 0)).toBe(true); // worked by hand: equal values; the test compares values, not a rounded mean
    expect(correlation.isUndefinedRow!(rowsOf([2, 2, 3]), 3, 0)).toBe(false);
  });

  it("correlation: every one-feature row is constant, so undefined; the zero row (0, 0) is undefined too", () => {
    expect(correlation.isUndefinedRow!(rowsOf([5]), 1, 0)).toBe(true); // worked by hand: one value has no spread
    expect(correlation.isUndefinedRow!(rowsOf([0, 0]), 2, 0)).toBe(true); // worked by hand
  });

  it("correlation: reads row i only — row 1 of (1, 2, 3), (7, 7, 7), (3, 2, 1) is undefined", () => {
    const values = rowsOf([1, 2, 3], [7, 7, 7], [3, 2, 1]);
    expect([0, 1, 2].map((i) => correlation.isUndefinedRow!(values, 3, i))).toEqual([false, true, false]); // worked by hand
  });

  it("the distance on an undefined row is NaN (0/0), which is why such rows are left out of a build", () => {
    expect(cosine.distance(rowsOf([0, 0], [1, 2]), 2, 0, 1)).toBeNaN(); // worked by hand: 1 − 0/√0
    expect(correlation.distance(rowsOf([2, 2, 2], [1, 2, 3]), 3, 0, 1)).toBeNaN(); // worked by hand: centred row is 0
  });

  it("euclidean, manhattan and chebyshev are defined on every row: they have no isUndefinedRow", () => {
    for (const metric of [euclidean, manhattan, chebyshev]) expect(metric.isUndefinedRow).toBeUndefined();
  });
});

describe("metric registry with five metrics", () => {
  it("lists euclidean, manhattan, chebyshev, cosine and correlation, and maybeMetric returns each by name", () => {
    expect(metricNames).toEqual(["euclidean", "manhattan", "chebyshev", "cosine", "correlation"]); // the registry order in src/core/metric/metrics.ts
    expect(maybeMetric("manhattan")).toBe(manhattan);
    expect(maybeMetric("chebyshev")).toBe(chebyshev);
    expect(maybeMetric("cosine")).toBe(cosine);
    expect(maybeMetric("correlation")).toBe(correlation);
    for (const name of metricNames) expect(maybeMetric(name)).toBe(metrics[name]);
  });

  it("maybeMetric rejects unknown names with `invalid metric: NAME`, matching case exactly", () => {
    expect(() => maybeMetric("minkowski")).toThrow("invalid metric: minkowski");
    expect(() => maybeMetric("Cosine")).toThrow("invalid metric: Cosine");
    expect(() => maybeMetric("pearson")).toThrow("invalid metric: pearson");
    expect(() => maybeMetric(" euclidean")).toThrow("invalid metric:  euclidean");
  });
});
