import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { ballMembership, euclidean, randomSource, rowsToNodes, shuffledOrder, type NumericTable } from "../../../src/core/index.ts";
import { greedyNet } from "../support/nets.ts";
import { allLists, bruteBalls, isWithin } from "../support/bruteForce.ts";
import { gridRadius, gridTable, landmarkRule } from "../support/gridTable.ts";

const orderFor = (rows: number, { rule, seed }: { rule: "greedy-file-order" | "greedy-shuffled"; seed: number }): Uint32Array =>
  rule === "greedy-shuffled" ? shuffledOrder(rows, randomSource(seed)) : Uint32Array.from({ length: rows }, (_, i) => i);

describe("ballMembership", () => {
  it("the JSDoc example: 0, 1, 2, 3 with r = 1 around rows 0 and 2 gives offsets 0, 2, 5 and items 0, 1, 1, 2, 3", () => {
    const line0to3: NumericTable = { rows: 4, columns: 1, names: ["x"], values: Float64Array.of(0, 1, 2, 3) };
    const members = ballMembership(line0to3, euclidean, 1, Uint32Array.of(0, 2));
    expect(Array.from(members.offsets)).toEqual([0, 2, 5]); // worked by hand: B(0) = {0, 1}, B(2) = {1, 2, 3}
    expect(Array.from(members.items)).toEqual([0, 1, 1, 2, 3]); // worked by hand
  });

  it("no landmarks give one offset 0 and no items", () => {
    const table: NumericTable = { rows: 3, columns: 1, names: ["x"], values: Float64Array.of(0, 1, 2) };
    const members = ballMembership(table, euclidean, 1, new Uint32Array(0));
    expect(Array.from(members.offsets)).toEqual([0]);
    expect(members.items.length).toBe(0);
  });

  it("grows its item buffer past the first allocation: 40 identical rows around 3 landmarks give 120 memberships", () => {
    const table: NumericTable = { rows: 40, columns: 1, names: ["x"], values: new Float64Array(40) };
    const members = ballMembership(table, euclidean, 1, Uint32Array.of(0, 1, 2));
    expect(Array.from(members.offsets)).toEqual([0, 40, 80, 120]); // worked by hand: every row in every ball
    expect(members.items.length).toBe(120);
  });

  it("reports progress after every 64 landmarks", () => {
    const table: NumericTable = { rows: 130, columns: 1, names: ["x"], values: Float64Array.from({ length: 130 }, (_, i) => i) };
    const reports: number[] = [];
    ballMembership(table, euclidean, 0.5, Uint32Array.from({ length: 130 }, (_, i) => i), { onProgress: (fraction) => reports.push(fraction) });
    expect(reports).toEqual([64 / 130, 128 / 130]); // worked by hand: after k = 63 and k = 127
  });

  it("each ball holds exactly the rows within r of its landmark, ascending (both landmark rules)", () => {
    fc.assert(
      fc.property(gridTable, gridRadius, landmarkRule, (table, radius, rule) => {
        const landmarks = greedyNet(table, euclidean, radius, orderFor(table.rows, rule));
        const members = ballMembership(table, euclidean, radius, landmarks);
        expect(allLists(members)).toEqual(bruteBalls(table.rows, Array.from(landmarks), (l, i) => isWithin(table, l, i, radius)));
      }),
    );
  });

  it("every row of a net's table belongs to at least one ball, and each ball holds its landmark", () => {
    fc.assert(
      fc.property(gridTable, gridRadius, landmarkRule, (table, radius, rule) => {
        const landmarks = greedyNet(table, euclidean, radius, orderFor(table.rows, rule));
        const rowNodes = rowsToNodes(ballMembership(table, euclidean, radius, landmarks), table.rows);
        for (let i = 0; i < table.rows; ++i) expect(rowNodes.offsets[i + 1]! - rowNodes.offsets[i]!).toBeGreaterThan(0);
        const balls = allLists(ballMembership(table, euclidean, radius, landmarks));
        landmarks.forEach((l, k) => expect(balls[k]).toContain(l));
      }),
    );
  });
});

describe("rowsToNodes", () => {
  it("transposes node lists {0, 1}, {1, 2, 3} over 4 rows into row lists {0}, {0, 1}, {1}, {1}", () => {
    const rowNodes = rowsToNodes({ offsets: Uint32Array.of(0, 2, 5), items: Uint32Array.of(0, 1, 1, 2, 3) }, 4);
    expect(Array.from(rowNodes.offsets)).toEqual([0, 1, 3, 4, 5]); // worked by hand
    expect(Array.from(rowNodes.items)).toEqual([0, 0, 1, 1, 1]); // worked by hand
  });

  it("a row in no ball gets an empty list", () => {
    const rowNodes = rowsToNodes({ offsets: Uint32Array.of(0, 1), items: Uint32Array.of(2) }, 3);
    expect(allLists(rowNodes)).toEqual([[], [], [0]]);
  });

  it("holds the same (node, row) pairs as its input, with each row's nodes ascending", () => {
    fc.assert(
      fc.property(gridTable, gridRadius, landmarkRule, (table, radius, rule) => {
        const members = ballMembership(table, euclidean, radius, greedyNet(table, euclidean, radius, orderFor(table.rows, rule)));
        const rowNodes = allLists(rowsToNodes(members, table.rows));
        const fromNodes = allLists(members).flatMap((rows, k) => rows.map((i) => `${k}:${i}`)).sort();
        const fromRows = rowNodes.flatMap((nodes, i) => nodes.map((k) => `${k}:${i}`)).sort();
        expect(fromRows).toEqual(fromNodes);
        for (const nodes of rowNodes) expect(nodes).toEqual([...nodes].sort((a, b) => a - b));
      }),
    );
  });
});
