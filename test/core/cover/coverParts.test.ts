import { describe, expect, it } from "vitest";
import fc from "fast-check";
import {
  blockMembership,
  buildCover,
  createRowIndex,
  edgeCuts,
  euclidean,
  greedyBalls,
  joinEdgeLists,
  overlapEdges,
  overlapEdgesPart,
  rowsToNodes,
  runCoverPart,
  indexParts,
  coverSteps,
  type CompressedLists,
  type CoverParams,
  type CoverResult,
  type NumericTable,
  type ParsedTable,
} from "../../../src/core/index.ts";
import { buildArrays, splitCase } from "../support/splitCase.ts";

const plain = (lists: CompressedLists) => ({ offsets: Array.from(lists.offsets), items: Array.from(lists.items) });
const edgeArrays = (edges: { source: Uint32Array; target: Uint32Array; shared: Uint32Array }) => ({ source: Array.from(edges.source), target: Array.from(edges.target), shared: Array.from(edges.shared) });

// a split point list 0 = b0 ≤ b1 ≤ … ≤ bk = total, from random cut positions
const cutsOf = (total: number, cuts: number[]): number[] => [0, ...cuts.map((c) => c % (total + 1)).sort((a, b) => a - b), total];

/** Random row → nodes lists over `nodes` nodes: each row holds a random ascending subset. */
const rowLists = (nodes: number): fc.Arbitrary<CompressedLists> =>
  fc.array(fc.uniqueArray(fc.integer({ min: 0, max: nodes - 1 }), { maxLength: 6 }), { minLength: 1, maxLength: 200 }).map((rows) => {
    const sorted = rows.map((row) => [...row].sort((a, b) => a - b));
    const offsets = Uint32Array.from([0, ...sorted.map((_, i) => sorted.slice(0, i + 1).flat().length)]);
    return { offsets, items: Uint32Array.from(sorted.flat()) };
  });

describe("edge parts", () => {
  it("edgeCuts of one row holding nodes 0, 1, 2 in two parts cuts after node 0 (2 of the 3 pairs have lower node 0)", () => {
    expect(edgeCuts({ offsets: Uint32Array.of(0, 3), items: Uint32Array.of(0, 1, 2) }, 3, 2)).toEqual({ bounds: [0, 1, 3], pairs: 3 }); // worked by hand
  });

  it("overlapEdgesPart over any split of the nodes, joined in order, is overlapEdges: dense (≤ 2,048 nodes) and sparse (3,000 nodes)", () => {
    for (const nodes of [12, 3000]) {
      fc.assert(
        fc.property(rowLists(nodes), fc.array(fc.nat(), { maxLength: 4 }), (rowNodes, cuts) => {
          const bounds = cutsOf(nodes, cuts);
          const members = rowsToNodes(rowNodes, nodes);
          const parts = bounds.slice(0, -1).map((from, k) => overlapEdgesPart(rowNodes, nodes, from, bounds[k + 1]!, members));
          expect(edgeArrays(joinEdgeLists(parts))).toEqual(edgeArrays(overlapEdges(rowNodes, nodes)));
        }),
        { numRuns: nodes > 2048 ? 20 : 100 },
      );
    }
  });

  it("edgeCuts' bounds ascend from 0 to the node count, one more than the parts", () => {
    fc.assert(
      fc.property(rowLists(40), fc.integer({ min: 1, max: 5 }), (rowNodes, parts) => {
        const { bounds } = edgeCuts(rowNodes, 40, parts);
        expect(bounds.length).toBe(parts + 1);
        expect(bounds[0]).toBe(0);
        expect(bounds.at(-1)).toBe(40);
        for (let k = 1; k < bounds.length; ++k) expect(bounds[k]!).toBeGreaterThanOrEqual(bounds[k - 1]!);
      }),
    );
  });

  it("a node range outside 0..nodes is refused", () => {
    expect(() => overlapEdgesPart({ offsets: Uint32Array.of(0), items: new Uint32Array(0) }, 3, 2, 4)).toThrow("invalid node range: 2..4 of 3");
  });
});

describe("ball parts", () => {
  it("runCoverPart's balls over any split of the landmarks, concatenated, are blockMembership's of all of them", () => {
    const table = fc.record({ rows: fc.integer({ min: 1, max: 150 }), columns: fc.integer({ min: 1, max: 9 }) }).chain(({ rows, columns }) =>
      fc.array(fc.integer({ min: -4, max: 4 }), { minLength: rows * columns, maxLength: rows * columns }).map((cells): NumericTable => ({ rows, columns, names: [], values: Float64Array.from(cells, (k) => k / 2) })),
    );
    fc.assert(
      fc.property(table, fc.integer({ min: 1, max: 8 }), fc.array(fc.nat(), { maxLength: 3 }), (numbers, halfRadius, cuts) => {
        const radius = halfRadius / 2;
        const index = createRowIndex(numbers, euclidean);
        const { landmarks } = greedyBalls(index, radius, Uint32Array.from({ length: numbers.rows }, (_, i) => i), { balls: false });
        const whole = blockMembership(index, radius, landmarks);
        const task = { kind: "balls" as const, index: indexParts(index, radius, (array) => array.slice() as typeof array), landmarks };
        const bounds = cutsOf(landmarks.length, cuts);
        const parts = bounds.slice(0, -1).map((from, k) => runCoverPart(task, { from, to: bounds[k + 1]! }) as CompressedLists);
        const offsets = [0];
        for (const part of parts) for (let l = 1; l < part.offsets.length; ++l) offsets.push(offsets.at(-1)! + part.offsets[l]! - part.offsets[l - 1]!);
        expect({ offsets, items: parts.flatMap((part) => Array.from(part.items)) }).toEqual(plain(whole));
      }),
    );
  });
});

/** coverSteps driven in this thread as buildCover drives them, noting which kinds of step were split. */
function drive(parsed: ParsedTable, params: CoverParams, parts: number, split: Set<string>): CoverResult {
  const steps = coverSteps(parsed, params, { parts, minPartWork: 0 }, null);
  for (let next = steps.next(); ; ) {
    if (next.done) return next.value;
    const { task, remote, local } = next.value;
    if (remote.length > 0) split.add(task.kind);
    local();
    next = steps.next(remote.map((range) => runCoverPart(task, range)));
  }
}

describe("buildCover in parts", () => {
  it("gives the same landmarks, members, edges, components and b0/b1 in 1, 2 or 3 parts (every metric and rule), the balls and the edges both split", () => {
    const split = new Set<string>();
    fc.assert(
      fc.property(splitCase, fc.integer({ min: 2, max: 3 }), ({ parsed, params }, parts) => {
        const whole = buildCover(parsed, params);
        expect(buildArrays(buildCover(parsed, params, { parts, minPartWork: 0 }))).toEqual(buildArrays(whole));
        expect(buildArrays(drive(parsed, params, parts, split))).toEqual(buildArrays(whole));
      }),
      { numRuns: 40 },
    );
    expect([...split].sort()).toEqual(["balls", "edges"]);
  });
});
