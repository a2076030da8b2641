// Every landmark rule (greedy, random, maximin) under every metric, on random small tables of
// halves −3..3 (ties d = r and duplicate rows are common), with rows where the metric is undefined
// removed first, as a build does. "Within" is always the metric's reference predicate.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { createRowIndex, landmarkBalls, metrics, randomSource, shuffledOrder, type LandmarkRule, type Metric, type NumericTable } from "../../../src/core/index.ts";
import { bruteGreedyNet } from "../support/bruteForce.ts";
import { definedRows, radiusFor } from "../support/definedTable.ts";
import { gridTable } from "../support/gridTable.ts";

const rules: readonly LandmarkRule[] = ["greedy-file-order", "greedy-shuffled", "maximin"];
const seed = fc.integer({ min: -1000, max: 1000 });

/**
 * Maximin by the definition, recomputing everything at each step: the first landmark is `start`;
 * then, among rows within r of no landmark, take the one whose nearest landmark is farthest
 * (the lowest row on ties); stop when every row is within r of a landmark.
 */
function bruteMaximin(table: NumericTable, metric: Metric, radius: number, start: number): number[] {
  const { values, columns: d, rows: n } = table;
  const landmarks = [start];
  for (;;) {
    let best = -1;
    let bestDistance = -Infinity;
    for (let i = 0; i < n; ++i) {
      if (landmarks.some((l) => metric.within(values, d, l, i, radius))) continue;
      const nearest = Math.min(...landmarks.map((l) => metric.distance(values, d, l, i)));
      if (nearest > bestDistance) {
        best = i;
        bestDistance = nearest;
      }
    }
    if (best < 0) return landmarks;
    landmarks.push(best);
  }
}

const rows = (n: number): number[] => Array.from({ length: n }, (_, i) => i);

for (const metric of Object.values(metrics) as Metric[]) {
  const cases = fc.record({ table: gridTable.map((t) => definedRows(t, metric)), radius: radiusFor(metric), rule: fc.constantFrom(...rules), seed });

  describe(`landmark rules under ${metric.name}`, () => {
    it("every rule gives an r-net: each row within r of a landmark, landmarks pairwise not within r", () => {
      fc.assert(
        fc.property(cases, ({ table, radius, rule, seed: s }) => {
          const { values, columns: d } = table;
          const landmarks = Array.from(landmarkBalls(createRowIndex(table, metric), radius, rule, s).landmarks);
          const within = (a: number, b: number): boolean => metric.within(values, d, a, b, radius);
          const uncovered = rows(table.rows).filter((i) => !landmarks.some((l) => within(l, i)));
          const closePairs = landmarks.flatMap((a, k) => landmarks.slice(k + 1).filter((b) => within(a, b) || within(b, a)).map((b) => [a, b]));
          expect(new Set(landmarks).size).toBe(landmarks.length);
          expect(landmarks.every((l) => l < table.rows)).toBe(true);
          expect(uncovered).toEqual([]);
          expect(closePairs).toEqual([]);
        }),
      );
    });

    it("the same seed gives identical landmarks for every rule", () => {
      fc.assert(
        fc.property(cases, ({ table, radius, rule, seed: s }) => {
          expect(Array.from(landmarkBalls(createRowIndex(table, metric), radius, rule, s).landmarks)).toEqual(Array.from(landmarkBalls(createRowIndex(table, metric), radius, rule, s).landmarks));
        }),
      );
    });

    it("greedy and random choose what a brute-force greedy net chooses over file order and over the seeded shuffle", () => {
      fc.assert(
        fc.property(cases, ({ table, radius, rule, seed: s }) => {
          fc.pre(rule !== "maximin");
          const order = rule === "greedy-shuffled" ? shuffledOrder(table.rows, randomSource(s)) : rows(table.rows);
          const expected = bruteGreedyNet(order, (l, i) => metric.within(table.values, table.columns, l, i, radius));
          expect(Array.from(landmarkBalls(createRowIndex(table, metric), radius, rule, s).landmarks)).toEqual(expected);
        }),
      );
    });

    it("maximin starts at floor(u · n) for the seed's first draw u, then adds the uncovered row farthest from its nearest landmark (ties to the lowest row), as a brute-force version does", () => {
      fc.assert(
        fc.property(cases, ({ table, radius, seed: s }) => {
          fc.pre(table.rows > 0);
          const start = Math.floor(randomSource(s)() * table.rows);
          const landmarks = Array.from(landmarkBalls(createRowIndex(table, metric), radius, "maximin", s).landmarks);
          expect(landmarks[0]).toBe(start);
          expect(landmarks).toEqual(bruteMaximin(table, metric, radius, start));
        }),
      );
    });
  });
}
