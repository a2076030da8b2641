// Missing-value policies on one hand-worked file. Parsed rows (0-based; row k is data record k + 1):
//   0: x 1,  y 10, z 5
//   1: x NA, y 20, z 6
//   2: x 2,  y (empty), z 7
//   3: x 6,  y 40, z 8
//   4: x 9,  y NA, z 9
// x present: 1, 2, 6, 9 → median (type 7, h = 1.5) 2 + 0.5 · (6 − 2) = 4, mean 18/4 = 4.5; 1 missing.
// y present: 10, 20, 40 → median 20, mean 70/3; 2 missing. z: nothing missing. (All worked by hand.)
import { describe, expect, it } from "vitest";
import { buildCover, parseCsvText, selectFeatures, type CoverParams } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";
import { allLists } from "../support/bruteForce.ts";

const parsed = Object.freeze(parseCsvText("x,y,z\n1,10,5\nNA,20,6\n2,,7\n6,40,8\n9,NA,9\n"));

const params = (patch: Partial<CoverParams>): CoverParams =>
  Object.freeze({ features: ["x", "y"], scale: "none", metric: "euclidean", radius: 0.5, landmarks: "greedy-file-order", seed: 1, ...patch });

describe("selectFeatures missing-value policies", () => {
  it("median fills x with 4 and y with 20, keeps every row and counts 1 and 2 imputed values", () => {
    const selection = selectFeatures(parsed, ["x", "y"], "median");
    expect(Array.from(selection.table.values)).toEqual([1, 10, 4, 20, 2, 20, 6, 40, 9, 20]); // worked by hand
    expect(Array.from(selection.usedRows)).toEqual([0, 1, 2, 3, 4]); // worked by hand: no row dropped under median
    expect(Array.from(selection.droppedRows)).toEqual([]);
    expect(selection.imputed).toEqual({ x: 1, y: 2 }); // worked by hand
  });

  it("mean fills x with 4.5 and y with 70/3, with the same counts", () => {
    const selection = selectFeatures(parsed, ["x", "y"], "mean");
    assertClose(selection.table.values, [1, 10, 4.5, 20, 2, 70 / 3, 6, 40, 9, 70 / 3]); // worked by hand
    expect(selection.imputed).toEqual({ x: 1, y: 2 }); // worked by hand
  });

  it("a feature with nothing missing is counted as 0 imputed", () => {
    expect(selectFeatures(parsed, ["z", "x"], "median").imputed).toEqual({ z: 0, x: 1 }); // worked by hand
  });

  it("drop keeps rows 0 and 3, returns the dropped row numbers 1, 2, 4, and imputes nothing", () => {
    const selection = selectFeatures(parsed, ["x", "y"], "drop");
    expect(Array.from(selection.table.values)).toEqual([1, 10, 6, 40]); // worked by hand
    expect(Array.from(selection.usedRows)).toEqual([0, 3]); // worked by hand
    expect(Array.from(selection.droppedRows)).toEqual([1, 2, 4]); // worked by hand
    expect(selection.imputed).toEqual({});
  });

  it("drop is the default, and dropping depends only on the chosen features: x alone drops row 1 only", () => {
    expect(Array.from(selectFeatures(parsed, ["x", "y"]).droppedRows)).toEqual([1, 2, 4]); // worked by hand: x misses row 1, y rows 2 and 4
    expect(Array.from(selectFeatures(parsed, ["x"]).droppedRows)).toEqual([1]); // worked by hand
    expect(Array.from(selectFeatures(parsed, ["z"]).droppedRows)).toEqual([]);
  });
});

describe("buildCover with a missing-value policy", () => {
  it("median: every row is used, none dropped, imputed {x: 1, y: 2}", () => {
    const result = buildCover(parsed, params({ missing: "median" }));
    expect(Array.from(result.usedRows)).toEqual([0, 1, 2, 3, 4]); // worked by hand: no row dropped under median
    expect(Array.from(result.droppedRows)).toEqual([]);
    expect(result.imputed).toEqual({ x: 1, y: 2 }); // worked by hand
  });

  it("median on y alone puts rows 1, 2, 4 (20, and 20 filled in twice) in one ball at r = 0.5", () => {
    const result = buildCover(parsed, params({ features: ["y"], missing: "median" }));
    expect(allLists(result.members)).toEqual([[0], [1, 2, 4], [3]]); // worked by hand: y = 10, 20, 20, 40, 20
  });

  it("mean on y alone puts the two filled rows 2, 4 (70/3) together, apart from row 1 (20)", () => {
    const result = buildCover(parsed, params({ features: ["y"], missing: "mean" }));
    expect(allLists(result.members)).toEqual([[0], [1], [2, 4], [3]]); // worked by hand: 70/3 − 20 = 10/3 > 0.5
  });

  it("drop: used rows 0, 3, dropped rows 1, 2, 4 kept in the result, nothing imputed", () => {
    const result = buildCover(parsed, params({ missing: "drop" }));
    expect(Array.from(result.usedRows)).toEqual([0, 3]); // worked by hand
    expect(Array.from(result.droppedRows)).toEqual([1, 2, 4]); // worked by hand
    expect(result.imputed).toEqual({});
    expect(allLists(result.members)).toEqual([[0], [3]]); // worked by hand: (1, 10) and (6, 40) are far apart at r = 0.5
  });

  it("throws for an unknown policy, naming it", () => {
    expect(() => buildCover(parsed, params({ missing: "zero" as never }))).toThrow("invalid missing-value policy: zero");
  });
});
