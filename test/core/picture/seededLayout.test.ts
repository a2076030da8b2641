import { describe, expect, it } from "vitest";
import { layoutTicks, seededLayout } from "../../../src/core/picture/seededLayout.ts";

/** A ring of `n` nodes of 4 rows each, neighbours sharing 2 rows, node k also sharing 1 row with k + 2: a graph built by hand. */
function ringGraph(n: number) {
  const offsets = Uint32Array.from({ length: n + 1 }, (_, k) => 4 * k);
  const source: number[] = [], target: number[] = [], shared: number[] = [];
  for (let k = 0; k < n; ++k) {
    for (const [step, rows] of [[1, 2], [2, 1]] as const) {
      const a = k, b = (k + step) % n;
      source.push(Math.min(a, b)); target.push(Math.max(a, b)); shared.push(rows);
    }
  }
  return {
    landmarks: Uint32Array.from({ length: n }, (_, k) => k),
    members: { offsets, items: Uint32Array.from({ length: 4 * n }, (_, i) => i) },
    edges: { source: Uint32Array.from(source), target: Uint32Array.from(target), shared: Uint32Array.from(shared) },
  };
}

describe("layoutTicks", () => {
  it("d3-force's defaults (alphaMin 0.001, alphaDecay 1 − 0.001^(1/300)) give exactly 300 ticks (d3-force README: 300 iterations)", () => {
    expect(layoutTicks(0.001, 1 - 0.001 ** (1 / 300))).toBe(300);
  });

  it("alphaDecay 0.5 to alphaMin 0.01 takes 7 ticks (worked by hand: 0.5^6 = 0.0156 > 0.01 ≥ 0.5^7 = 0.0078)", () => {
    expect(layoutTicks(0.01, 0.5)).toBe(7);
  });

  it("rejects settings that never stop", () => {
    expect(() => layoutTicks(0.001, 0)).toThrow("invalid alpha settings: alphaMin 0.001, alphaDecay 0");
  });
});

describe("seededLayout", () => {
  const graph = ringGraph(12);

  it("the same graph and seed give the same places, bit for bit", () => {
    const first = seededLayout(graph, { seed: 7 });
    const second = seededLayout(graph, { seed: 7 });
    expect(Array.from(second.x)).toEqual(Array.from(first.x));
    expect(Array.from(second.y)).toEqual(Array.from(first.y));
  });

  it("another seed gives other places (the starting order on the spiral is shuffled by the seed)", () => {
    expect(Array.from(seededLayout(graph, { seed: 2 }).x)).not.toEqual(Array.from(seededLayout(graph, { seed: 1 }).x));
  });

  it("gives one finite place per node, all nodes the same radius 26 when all hold 4 rows (nodeRadius of the largest)", () => {
    const layout = seededLayout(graph);
    expect(layout.x.length).toBe(12);
    expect(Array.from(layout.x).every(Number.isFinite) && Array.from(layout.y).every(Number.isFinite)).toBe(true);
    expect(Array.from(layout.radius)).toEqual(new Array(12).fill(26)); // 26 · √(4/4), nodeRadius.ts
  });

  it("springs pull neighbours closer than nodes half the ring apart", () => {
    const { x, y } = seededLayout(graph);
    const distance = (a: number, b: number): number => Math.hypot(x[a]! - x[b]!, y[a]! - y[b]!);
    let neighbours = 0, opposite = 0;
    for (let k = 0; k < 12; ++k) {
      neighbours += distance(k, (k + 1) % 12);
      opposite += distance(k, (k + 6) % 12);
    }
    expect(neighbours).toBeLessThan(opposite);
  });

  it("keeps the maxEdges edges sharing the most rows, ascending: with 12 the twelve 2-row ring edges", () => {
    const { edges } = seededLayout(graph, { maxEdges: 12 });
    expect(Array.from(edges, (e) => graph.edges.shared[e])).toEqual(new Array(12).fill(2));
    expect(Array.from(edges)).toEqual([...edges].sort((a, b) => a - b));
  });

  it("a graph with no nodes gives empty arrays", () => {
    const empty = seededLayout({ landmarks: new Uint32Array(0), members: { offsets: Uint32Array.of(0), items: new Uint32Array(0) }, edges: { source: new Uint32Array(0), target: new Uint32Array(0), shared: new Uint32Array(0) } });
    expect([empty.x.length, empty.edges.length]).toEqual([0, 0]);
  });
});
