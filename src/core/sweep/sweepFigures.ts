import type { CoverFigures } from "./coverFigures.ts";

/** Per-radius figures of a sweep as columns (typed arrays, transferable), radii ascending. */
export interface SweepFigures {
  readonly radius: Float64Array;
  readonly nodes: Uint32Array;
  readonly edges: Uint32Array;
  /** Connected components: b0 of the nerve. */
  readonly b0: Uint32Array;
  readonly b1: Uint32Array;
  /** E − V + C. */
  readonly cycleRank: Uint32Array;
  /** Mean number of balls holding a row. */
  readonly ballsPerRow: Float64Array;
  /** Share of the rows in the largest ball. */
  readonly largestNodeShare: Float64Array;
  /** Share of the rows in the component holding the most rows. */
  readonly largestComponentShare: Float64Array;
}

/** Columns for the given radii (ascending), every figure 0 until set. */
export function emptyFigures(radii: Float64Array): SweepFigures {
  const count = radii.length;
  const whole = (): Uint32Array => new Uint32Array(count);
  const real = (): Float64Array => new Float64Array(count);
  return { radius: Float64Array.from(radii), nodes: whole(), edges: whole(), b0: whole(), b1: whole(), cycleRank: whole(), ballsPerRow: real(), largestNodeShare: real(), largestComponentShare: real() };
}

/** Writes one radius's figures into row k of the columns. */
export function setFigures(figures: SweepFigures, k: number, row: CoverFigures): void {
  figures.nodes[k] = row.nodes;
  figures.edges[k] = row.edges;
  figures.b0[k] = row.b0;
  figures.b1[k] = row.b1;
  figures.cycleRank[k] = row.cycleRank;
  figures.ballsPerRow[k] = row.ballsPerRow;
  figures.largestNodeShare[k] = row.largestNodeShare;
  figures.largestComponentShare[k] = row.largestComponentShare;
}

/** The buffers of the columns, for a worker to transfer. */
export function figureBuffers(figures: SweepFigures): ArrayBuffer[] {
  return Object.values(figures).map((column: Float64Array | Uint32Array) => column.buffer as ArrayBuffer);
}
