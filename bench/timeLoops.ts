// Times the loops phase of a build (nerve triangles, then b0/b1) the way buildCover runs it, once,
// unless the triangle listing would visit more than `limit` row triples (Σ over rows of C(c, 3)
// for a row in c balls): the current listing keeps every triple in a Set, which then takes
// minutes or exceeds the Set's size limit.
import { performance } from "node:perf_hooks";
import { nerveBetti, nerveTriangles, rowsToNodes, type CoverResult } from "../src/core/index.ts";

export interface LoopsTiming {
  readonly skipped: boolean;
  readonly tripleVisits: number;
  readonly ms: number;
  readonly triangles: number;
  readonly b1: number;
}

export function timeLoops(result: CoverResult, limit = 2.5e7): LoopsTiming {
  const rows = result.usedRows.length;
  const local = new Map(Array.from(result.usedRows, (row, i) => [row, i] as const));
  const members = { offsets: result.members.offsets, items: Uint32Array.from(result.members.items, (row) => local.get(row)!) };
  const rowNodes = rowsToNodes(members, rows);
  let tripleVisits = 0;
  for (let i = 0; i < rows; ++i) {
    const c = rowNodes.offsets[i + 1]! - rowNodes.offsets[i]!;
    tripleVisits += (c * (c - 1) * (c - 2)) / 6;
  }
  if (tripleVisits > limit) return { skipped: true, tripleVisits, ms: NaN, triangles: NaN, b1: NaN };
  const t0 = performance.now();
  const betti = nerveBetti(result.landmarks.length, result.edges, result.componentCount, nerveTriangles(rowNodes, result.landmarks.length));
  return { skipped: false, tripleVisits, ms: performance.now() - t0, triangles: betti.triangles, b1: betti.b1 };
}
