import type { CompressedLists } from "../lists/compressedLists.ts";
import type { SweepCover } from "./coverFromBalls.ts";

/** The per-radius figures of a sweep. Shares are of the rows used; NaN when no row is used. */
export interface CoverFigures {
  readonly nodes: number;
  readonly edges: number;
  /** Connected components (b0 of the nerve). */
  readonly b0: number;
  readonly b1: number;
  readonly cycleRank: number;
  /** Memberships / rows: how many balls hold a row, on average (≥ 1, since every row is covered). */
  readonly ballsPerRow: number;
  /** Rows of the largest ball / rows. */
  readonly largestNodeShare: number;
  /** Rows whose balls lie in the most populous component / rows (a row's balls share one component). */
  readonly largestComponentShare: number;
}

/**
 * Figures of one cover: counts, mean balls per row, the largest ball's share of the rows and the
 * share of rows in the component holding the most rows. O(m + V) for m memberships.
 * @example coverFigures(the line 0, 1, 2 at r = 1: balls {0, 1}, {1, 2}) // => { nodes: 2, edges: 1, b0: 1, b1: 0, cycleRank: 0, ballsPerRow: 4/3, largestNodeShare: 2/3, largestComponentShare: 1 }
 */
export function coverFigures(cover: SweepCover, rowNodes: CompressedLists): CoverFigures {
  const rows = rowNodes.offsets.length - 1;
  const { offsets } = cover.members;
  let largestNode = 0;
  for (let k = 0; k + 1 < offsets.length; ++k) largestNode = Math.max(largestNode, offsets[k + 1]! - offsets[k]!);
  const perComponent = new Uint32Array(cover.componentCount);
  for (let i = 0; i < rows; ++i) {
    if (rowNodes.offsets[i + 1]! > rowNodes.offsets[i]!) perComponent[cover.component[rowNodes.items[rowNodes.offsets[i]!]!]!]!++;
  }
  const largestComponent = perComponent.reduce((a, b) => Math.max(a, b), 0);
  return {
    nodes: cover.landmarks.length,
    edges: cover.edges.source.length,
    b0: cover.betti.b0,
    b1: cover.betti.b1,
    cycleRank: cover.cycleRank,
    ballsPerRow: rows === 0 ? NaN : rowNodes.items.length / rows,
    largestNodeShare: rows === 0 ? NaN : largestNode / rows,
    largestComponentShare: rows === 0 ? NaN : largestComponent / rows,
  };
}
