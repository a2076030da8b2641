import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { buildCover, euclidean, parseCsvText, randomSource, shuffledOrder, type NumericTable } from "../../../src/core/index.ts";
import { greedyNet } from "../support/nets.ts";
import { bruteGreedyNet, isWithin } from "../support/bruteForce.ts";
import { gridRadius, gridTable, landmarkRule } from "../support/gridTable.ts";

const orderFor = (rows: number, { rule, seed }: { rule: "greedy-file-order" | "greedy-shuffled"; seed: number }): Uint32Array =>
  rule === "greedy-shuffled" ? shuffledOrder(rows, randomSource(seed)) : Uint32Array.from({ length: rows }, (_, i) => i);

describe("greedyNet", () => {
  it("the JSDoc example: 0, 1, 2 with r = 1 in file order gives landmarks 0 and 2", () => {
    const line: NumericTable = { rows: 3, columns: 1, names: ["x"], values: Float64Array.of(0, 1, 2) };
    expect(Array.from(greedyNet(line, euclidean, 1, Uint32Array.of(0, 1, 2)))).toEqual([0, 2]); // worked by hand: 1 is a tie with 0
  });

  it("an empty table gives no landmarks", () => {
    const empty: NumericTable = { rows: 0, columns: 2, names: ["a", "b"], values: new Float64Array(0) };
    expect(greedyNet(empty, euclidean, 1, new Uint32Array(0)).length).toBe(0);
  });

  it("duplicate rows give one landmark", () => {
    const copies: NumericTable = { rows: 4, columns: 2, names: ["a", "b"], values: new Float64Array(8).fill(3) };
    expect(Array.from(greedyNet(copies, euclidean, 1e-9, Uint32Array.of(2, 0, 1, 3)))).toEqual([2]); // worked by hand: the first visited
  });

  it("buildCover, the caller that takes a radius from outside, throws for one that is not positive and finite", () => {
    const one = parseCsvText("x\n0\n");
    for (const radius of [0, -1, NaN, Infinity]) expect(() => buildCover(one, { features: ["x"], scale: "none", metric: "euclidean", radius, landmarks: "greedy-file-order", seed: 1 })).toThrow(`invalid radius: ${radius}`);
  });

  it("reports progress every 256 rows visited (often enough to be cancelled within a fraction of a second)", () => {
    const rows = 768 + 5;
    const table: NumericTable = { rows, columns: 1, names: ["x"], values: new Float64Array(rows) };
    const reports: number[] = [];
    greedyNet(table, euclidean, 1, Uint32Array.from({ length: rows }, (_, i) => i), { onProgress: (fraction) => reports.push(fraction) });
    expect(reports).toEqual([256 / rows, 512 / rows, 768 / rows]); // worked by hand: after k = 255, 511 and 767
  });

  it("every row lies within r of some landmark, and landmarks are pairwise more than r apart (both rules)", () => {
    fc.assert(
      fc.property(gridTable, gridRadius, landmarkRule, (table, radius, rule) => {
        const landmarks = Array.from(greedyNet(table, euclidean, radius, orderFor(table.rows, rule)));
        for (let i = 0; i < table.rows; ++i) expect(landmarks.some((l) => isWithin(table, l, i, radius))).toBe(true);
        for (let a = 0; a < landmarks.length; ++a) {
          for (let b = a + 1; b < landmarks.length; ++b) expect(isWithin(table, landmarks[a]!, landmarks[b]!, radius)).toBe(false);
        }
      }),
    );
  });

  it("chooses exactly the rows a brute-force greedy net chooses, in the same order (both rules)", () => {
    fc.assert(
      fc.property(gridTable, gridRadius, landmarkRule, (table, radius, rule) => {
        const order = orderFor(table.rows, rule);
        const expected = bruteGreedyNet(order, (l, i) => isWithin(table, l, i, radius));
        expect(Array.from(greedyNet(table, euclidean, radius, order))).toEqual(expected);
      }),
    );
  });
});
