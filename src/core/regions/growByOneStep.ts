import type { CoverResult } from "../cover/buildCover.ts";

/**
 * `nodes` and every node one edge away from one of them, ascending ("grow one step").
 * Nodes outside [0, node count) are ignored. O(V + E).
 * @example growByOneStep({ edges: { source: Uint32Array.of(0, 1), target: Uint32Array.of(1, 2), shared: Uint32Array.of(1, 1) }, component: Uint32Array.of(0, 0, 0) }, [0]) // => [0, 1]
 */
export function growByOneStep(result: Pick<CoverResult, "edges" | "component">, nodes: readonly number[]): number[] {
  const inside = new Set(nodes.filter((k) => k < result.component.length));
  const grown = new Set(inside);
  const { source, target } = result.edges;
  for (let e = 0; e < source.length; ++e) {
    if (inside.has(source[e]!)) grown.add(target[e]!);
    if (inside.has(target[e]!)) grown.add(source[e]!);
  }
  return [...grown].sort((a, b) => a - b);
}
