import { describe, expect, it } from "vitest";
import { buildCover, prepareFeatures, readTableText } from "../../../src/core/index.ts";

// Categorical columns as features through one-hot indicators (issue: data in). Values worked by hand.
const text = ["x,site", "0,a", "0,b", "0,a", "10,b", "10,,", "10,a"].join("\n").replace(",,", ",") + "\n";

describe("one-hot features", () => {
  const { table } = readTableText(text);

  it("indicators follow the scaled numeric features, worth the column's weight, never scaled", () => {
    const prepared = prepareFeatures(table, { features: ["x"], scale: "none", oneHot: ["site"], weights: { site: 2 }, metric: "euclidean", missing: "drop" });
    expect(prepared.table.names).toEqual(["x", "site=a", "site=b"]);
    // row 5 (0-based 4) has no site: dropped under "drop" (worked by hand)
    expect(Array.from(prepared.droppedRows)).toEqual([4]);
    expect(Array.from(prepared.table.values)).toEqual([0, 2, 0, 0, 0, 2, 0, 2, 0, 10, 0, 2, 10, 2, 0]); // worked by hand: x, then 2·[site = a], 2·[site = b]
  });

  it("under imputation a missing level gives all-zero indicators and is counted as filled", () => {
    const prepared = prepareFeatures(table, { features: ["x"], scale: "none", oneHot: ["site"], metric: "euclidean", missing: "median" });
    expect(prepared.usedRows.length).toBe(6);
    expect(Array.from(prepared.table.values.subarray(4 * 3, 5 * 3))).toEqual([10, 0, 0]); // worked by hand
    expect(prepared.imputed.site).toBe(1);
  });

  it("with the site alone, radius 1 gives one node per level: rows with the same level are 0 apart, different levels √2 (weight 1)", () => {
    const result = buildCover(table, { features: [], oneHot: ["site"], scale: "none", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 });
    expect(result.landmarks.length).toBe(2); // worked by hand: levels a and b, √2 > 1 apart
    expect(result.edges.source.length).toBe(0);
  });

  it("a column that is not categorical cannot be one-hot encoded", () => {
    expect(() => buildCover(table, { features: [], oneHot: ["x"], scale: "none", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 })).toThrow("not a categorical column: x");
  });
});
