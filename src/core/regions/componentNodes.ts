import type { CoverResult } from "../cover/buildCover.ts";

/**
 * Every node in the same connected component as one of `nodes`, ascending ("select component").
 * Nodes outside [0, node count) are ignored. O(V).
 * @example componentNodes({ component: Uint32Array.of(0, 0, 1, 0) }, [1]) // => [0, 1, 3]
 */
export function componentNodes(result: Pick<CoverResult, "component">, nodes: readonly number[]): number[] {
  const wanted = new Set(nodes.filter((k) => k < result.component.length).map((k) => result.component[k]!));
  const out: number[] = [];
  for (let k = 0; k < result.component.length; ++k) if (wanted.has(result.component[k]!)) out.push(k);
  return out;
}
