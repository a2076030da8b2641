import { describe, expect, it } from "vitest";
import { countFamily, flexibleFamily, type FamilyGraph } from "../../../src/core/hotspots/flexibleFamily.ts";
import { landmarkNeighbours } from "../../../src/core/hotspots/landmarkNeighbours.ts";
import { euclidean } from "../../../src/core/index.ts";

/** A graph of `count` nodes at points on a plane, with the given edges; neighbours by distance, ties to the lower node (landmarkNeighbours). */
function graphOf(points: readonly (readonly [number, number])[], edges: readonly (readonly [number, number])[], maxNodes: number): FamilyGraph {
  const table = { rows: points.length, columns: 2, names: ["x", "y"], values: Float64Array.from(points.flat()) };
  const neighbours = landmarkNeighbours({ table, metric: euclidean, landmarkPositions: Uint32Array.from(points, (_, i) => i) }, maxNodes);
  return { neighbours, source: Uint32Array.from(edges, (e) => e[0]), target: Uint32Array.from(edges, (e) => e[1]) };
}

/** Brute force: every subset of nodes that is connected and lies within some member i's neighbourhood (i and its K − 1 nearest). */
function bruteForce(graph: FamilyGraph): string[] {
  const count = graph.neighbours.length;
  const adjacent = Array.from({ length: count }, () => new Set<number>());
  graph.source.forEach((s, e) => {
    adjacent[s]!.add(graph.target[e]!);
    adjacent[graph.target[e]!]!.add(s);
  });
  const found: string[] = [];
  for (let mask = 1; mask < 1 << count; ++mask) {
    const set = Array.from({ length: count }, (_, i) => i).filter((i) => mask & (1 << i));
    const seen = new Set([set[0]!]);
    const stack = [set[0]!];
    while (stack.length > 0) {
      for (const j of adjacent[stack.pop()!]!) {
        if (!set.includes(j) || seen.has(j)) continue;
        seen.add(j);
        stack.push(j);
      }
    }
    if (seen.size !== set.length) continue;
    if (set.some((i) => set.every((j) => j === i || graph.neighbours[i]!.includes(j)))) found.push(set.join(" "));
  }
  return found.sort();
}

const familySets = (graph: FamilyGraph): string[] => {
  const family = flexibleFamily(graph).family!;
  return Array.from({ length: family.offsets.length - 1 }, (_, k) => Array.from(family.nodes.subarray(family.offsets[k]!, family.offsets[k + 1]!)).join(" ")).sort();
};

const n = 6;
const line = Array.from({ length: n }, (_, i) => [i, 0] as const);
const pathEdges = Array.from({ length: n - 1 }, (_, i) => [i, i + 1] as const);
const circle = Array.from({ length: n }, (_, i) => [Math.cos((2 * Math.PI * i) / n), Math.sin((2 * Math.PI * i) / n)] as const);
const cycleEdges = [...pathEdges, [0, n - 1] as const];
const star = [[0, 0] as const, ...Array.from({ length: n - 1 }, (_, i) => [Math.cos((2 * Math.PI * i) / (n - 1)), Math.sin((2 * Math.PI * i) / (n - 1))] as const)];
const starEdges = Array.from({ length: n - 1 }, (_, i) => [0, i + 1] as const);
const completeEdges = Array.from({ length: n }, (_, i) => Array.from({ length: n - i - 1 }, (_, k) => [i, i + k + 1] as const)).flat();

const graphs = {
  path: [line, pathEdges],
  cycle: [circle, cycleEdges],
  star: [star, starEdges],
  complete: [circle, completeEdges],
} as const;

describe("the flexibly shaped family (Tango and Takahashi 2005) against brute-force enumeration", () => {
  for (const [name, [points, edges]] of Object.entries(graphs)) {
    for (const k of [1, 2, 3, 4, 6]) {
      it(`${name} of ${n} nodes, K = ${k}: the same sets as brute force, each once`, () => {
        const graph = graphOf(points, edges, k);
        const sets = familySets(graph);
        expect(new Set(sets).size).toBe(sets.length);
        expect(sets).toEqual(bruteForce(graph));
        expect(countFamily(graph)).toBe(sets.length);
        expect(flexibleFamily(graph).count).toBe(sets.length);
      });
    }
  }

  it("counts at K = N: path n(n+1)/2 = 21, cycle n(n−1)+1 = 31, star 2^(n−1)+n−1 = 37, complete 2^n − 1 = 63", () => {
    expect(countFamily(graphOf(line, pathEdges, n))).toBe(21); // worked by hand: intervals of a path of 6
    expect(countFamily(graphOf(circle, cycleEdges, n))).toBe(31); // worked by hand: 6 arcs of each length 1..5, plus the whole cycle
    expect(countFamily(graphOf(star, starEdges, n))).toBe(37); // worked by hand: the centre with any of 2^5 leaf sets, plus 5 lone leaves
    expect(countFamily(graphOf(circle, completeEdges, n))).toBe(63); // worked by hand: every non-empty subset of 6
  });

  it("counts at K = 1 and K = 2 on the path of 6: 6 singletons, then 6 + 5 pairs = 11", () => {
    expect(countFamily(graphOf(line, pathEdges, 1))).toBe(6); // worked by hand: each node alone
    // worked by hand: each node's nearest is its left neighbour (tie to the lower node) except node 0 (→ 1): pairs {0,1} … {4,5}
    expect(countFamily(graphOf(line, pathEdges, 2))).toBe(11);
  });

  it("counts at K = 3 on the path of 6: 15 (6 singletons, 5 pairs, 4 triples)", () => {
    // worked by hand: node i's 2 nearest are i − 1 and i + 1 (ends: the two next inward), so every interval of length ≤ 3 and no longer
    expect(countFamily(graphOf(line, pathEdges, 3))).toBe(15);
  });

  it("past its budget the family is counted but not packed: the complete graph of 6 at K = 6 counts 63 with a budget of 10", () => {
    const over = flexibleFamily(graphOf(circle, completeEdges, n), 10);
    expect(over.count).toBe(63); // worked by hand: every non-empty subset of 6
    expect(over.family).toBeNull();
    expect(flexibleFamily(graphOf(circle, completeEdges, n), 63).family!.offsets.length).toBe(64); // worked by hand: 63 sets fit a budget of 63
  });

  it("path 0–1–2 with K = 3 has 6 sets (the JSDoc example)", () => {
    expect(countFamily(graphOf(line.slice(0, 3), pathEdges.slice(0, 2), 3))).toBe(6); // worked by hand: 3 singletons, 2 pairs, 1 triple
  });

  it("landmark neighbours on a line at 0, 1, 3, 4 with K = 3 are [1, 2], [0, 2], [3, 1], [2, 1] (ties to the lower node)", () => {
    const table = { rows: 4, columns: 1, names: ["x"], values: Float64Array.of(0, 1, 3, 4) };
    const found = landmarkNeighbours({ table, metric: euclidean, landmarkPositions: Uint32Array.of(0, 1, 2, 3) }, 3);
    // worked by hand: from 1, nodes 0 and 2 lie at 1 and 2; from 3 (node 2), node 3 at 1 then node 1 at 2
    expect(found.map((list) => Array.from(list))).toEqual([[1, 2], [0, 2], [3, 1], [2, 1]]);
  });
});
