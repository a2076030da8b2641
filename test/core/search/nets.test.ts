import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { ballMembership, euclidean, randomSource, shuffledOrder } from "../../../src/core/index.ts";
import { greedyNet, maximinNet } from "../support/nets.ts";
import { firstHitNet } from "../../../src/core/landmark/firstHitNet.ts";
import { greedyBalls } from "../../../src/core/landmark/greedyBalls.ts";
import { maximinBalls } from "../../../src/core/landmark/maximinBalls.ts";
import { createRowIndex } from "../../../src/core/search/rowIndex.ts";
import { plainBall, plainGreedy, plainMaximin } from "./support/plainSearch.ts";
import { searchCase } from "./support/searchTables.ts";

const orderOf = (rows: number, seed: number | null): Uint32Array => (seed === null ? Uint32Array.from({ length: rows }, (_, i) => i) : shuffledOrder(rows, randomSource(seed)));
const seedOrNull = fc.option(fc.integer({ min: -1000, max: 1000 }), { nil: null });
const lists = (members: { offsets: Uint32Array; items: Uint32Array }): number[][] =>
  Array.from({ length: members.offsets.length - 1 }, (_, k) => Array.from(members.items.subarray(members.offsets[k]!, members.offsets[k + 1]!)));

describe("greedy nets with a candidate index", () => {
  it("greedyNet chooses the plain greedy net's landmarks, in the same order, for every metric, file or shuffled order, and leaf size", () => {
    fc.assert(
      fc.property(searchCase, seedOrNull, ({ table, metric, radius, leafSize }, seed) => {
        const order = orderOf(table.rows, seed);
        const index = createRowIndex(table, metric, { leafSize });
        expect(Array.from(greedyNet(table, metric, radius, order, { index }))).toEqual(plainGreedy(table, metric, radius, order));
        expect(Array.from(greedyNet(table, metric, radius, order))).toEqual(plainGreedy(table, metric, radius, order));
      }),
      { numRuns: 300 },
    );
  });

  it("greedyBalls returns the plain net and, when it kept them, each landmark's plain ball", () => {
    fc.assert(
      fc.property(searchCase, seedOrNull, ({ table, metric, radius, leafSize }, seed) => {
        const order = orderOf(table.rows, seed);
        const net = greedyBalls(createRowIndex(table, metric, { leafSize }), radius, order);
        const landmarks = Array.from(net.landmarks);
        expect(landmarks).toEqual(plainGreedy(table, metric, radius, order));
        if (net.members) expect(lists(net.members)).toEqual(landmarks.map((l) => plainBall(table, metric, l, radius)));
      }),
    );
  });

  it("firstHitNet continued from the rows the first landmarks cover completes the same net", () => {
    fc.assert(
      fc.property(searchCase, fc.nat(), ({ table, metric, radius }, cut) => {
        const order = orderOf(table.rows, null);
        const expected = plainGreedy(table, metric, radius, order);
        const from = cut % (table.rows + 1);
        const head = plainGreedy(table, metric, radius, order.subarray(0, from));
        const covered = new Uint8Array(table.rows);
        for (const l of head) for (const i of plainBall(table, metric, l, radius)) covered[i] = 1;
        const rest = firstHitNet(createRowIndex(table, metric), radius, order, { from, covered });
        expect([...head, ...rest]).toEqual(expected);
      }),
    );
  });

  it("maxLandmarks m stops the net at its first m + 1 landmarks", () => {
    fc.assert(
      fc.property(searchCase, fc.integer({ min: 0, max: 5 }), ({ table, metric, radius, leafSize }, limit) => {
        const order = orderOf(table.rows, null);
        const net = greedyBalls(createRowIndex(table, metric, { leafSize }), radius, order, { balls: false, maxLandmarks: limit });
        expect(Array.from(net.landmarks)).toEqual(plainGreedy(table, metric, radius, order).slice(0, limit + 1));
      }),
    );
  });
});

describe("farthest-point nets with a candidate index", () => {
  it("maximinNet chooses the plain farthest-point net's landmarks for every metric, start row and leaf size", () => {
    fc.assert(
      fc.property(searchCase, fc.nat(), ({ table, metric, radius, leafSize }, pick) => {
        const start = pick % table.rows;
        const index = createRowIndex(table, metric, { leafSize });
        expect(Array.from(maximinNet(table, metric, radius, start, { index }))).toEqual(plainMaximin(table, metric, radius, start));
      }),
      { numRuns: 300 },
    );
  });

  it("maximinBalls returns each landmark's plain ball", () => {
    fc.assert(
      fc.property(searchCase, fc.nat(), ({ table, metric, radius, leafSize }, pick) => {
        const net = maximinBalls(createRowIndex(table, metric, { leafSize }), radius, pick % table.rows);
        expect(lists(net.members!)).toEqual(Array.from(net.landmarks, (l) => plainBall(table, metric, l, radius)));
      }),
    );
  });
});

describe("balls of given landmarks", () => {
  it("ballMembership lists each landmark's plain ball, ascending, with boxes or a flat scan, for every metric", () => {
    fc.assert(
      fc.property(searchCase, fc.array(fc.nat(), { minLength: 1, maxLength: 150 }), fc.constantFrom("tree" as const, "flat" as const, "probe" as const), ({ table, metric, radius, leafSize }, picks, mode) => {
        const landmarks = Uint32Array.from(picks, (p) => p % table.rows);
        const index = createRowIndex(table, metric, { leafSize });
        Object.assign(index, { mode, modeRadius: radius });
        const expected = Array.from(landmarks, (l) => plainBall(table, metric, l, radius));
        expect(lists(ballMembership(table, metric, radius, landmarks, { index }))).toEqual(expected);
      }),
      { numRuns: 200 },
    );
  });

  it("reports progress after every 64 landmarks, as before the index (150 landmarks: after 64 and 128)", () => {
    const table = { rows: 10, columns: 1, names: ["x"], values: Float64Array.from({ length: 10 }, (_, i) => i) };
    const reports: number[] = [];
    ballMembership(table, euclidean, 1, new Uint32Array(150), { onProgress: (fraction) => reports.push(fraction) });
    expect(reports).toEqual([64 / 150, 128 / 150]); // worked by hand: after k = 63 and k = 127
  });
});
