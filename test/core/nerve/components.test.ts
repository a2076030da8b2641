import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { components } from "../../../src/core/index.ts";
import { bfsComponents } from "../support/bruteForce.ts";

// Random graphs: 0..30 nodes and up to 40 edges a < b between them.
const graph = fc.integer({ min: 0, max: 30 }).chain((nodes) =>
  fc
    .array(fc.tuple(fc.integer({ min: 0, max: Math.max(0, nodes - 1) }), fc.integer({ min: 0, max: Math.max(0, nodes - 1) })), { maxLength: nodes < 2 ? 0 : 40 })
    .map((pairs) => {
      const edges = pairs.filter(([a, b]) => a !== b).map(([a, b]): [number, number] => (a < b ? [a, b] : [b, a]));
      return { nodes, source: Uint32Array.from(edges, (e) => e[0]), target: Uint32Array.from(edges, (e) => e[1]) };
    }),
);

describe("components", () => {
  it("the JSDoc example: 3 nodes with edge 0–2 give components 0, 1, 0", () => {
    const result = components(3, Uint32Array.of(0), Uint32Array.of(2));
    expect(Array.from(result.component)).toEqual([0, 1, 0]); // worked by hand
    expect(result.count).toBe(2); // worked by hand
  });

  it("numbers components by their lowest node: edges 3–4 and 1–4 over 5 nodes give 0, 1, 2, 1, 1", () => {
    const result = components(5, Uint32Array.of(3, 1), Uint32Array.of(4, 4));
    expect(Array.from(result.component)).toEqual([0, 1, 2, 1, 1]); // worked by hand
    expect(result.count).toBe(3);
  });

  it("no nodes give no components; nodes without edges are each their own", () => {
    expect(components(0, new Uint32Array(0), new Uint32Array(0)).count).toBe(0);
    expect(Array.from(components(3, new Uint32Array(0), new Uint32Array(0)).component)).toEqual([0, 1, 2]);
  });

  it("a long chain joined from its far end still forms one component", () => {
    const n = 1000;
    const source = Uint32Array.from({ length: n - 1 }, (_, k) => n - 2 - k);
    const target = Uint32Array.from({ length: n - 1 }, (_, k) => n - 1 - k);
    const result = components(n, source, target);
    expect(result.count).toBe(1);
    expect(result.component.every((c) => c === 0)).toBe(true);
  });

  it("agrees with a breadth-first search on random graphs, numbering included", () => {
    fc.assert(
      fc.property(graph, ({ nodes, source, target }) => {
        const result = components(nodes, source, target);
        const expected = bfsComponents(nodes, source, target);
        expect(Array.from(result.component)).toEqual(expected.component);
        expect(result.count).toBe(expected.count);
      }),
    );
  });
});
