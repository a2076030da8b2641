import { createRowIndex, greedyBalls, maximinBalls, type Metric, type NumericTable, type RowIndex } from "../../../src/core/index.ts";

/**
 * Nets of a plain table for the tests, by core's one greedy loop (greedyBalls) and one maximin
 * loop (maximinBalls), on `options.index` or a fresh index; not reference implementations (those
 * are in bruteForce.ts), only a short way to call core's.
 */
export interface NetOptions {
  readonly index?: RowIndex;
  readonly onProgress?: (fraction: number) => void;
}

export function greedyNet(table: NumericTable, metric: Metric, radius: number, order: ArrayLike<number>, options: NetOptions = {}): Uint32Array {
  const { index = createRowIndex(table, metric), ...control } = options;
  return greedyBalls(index, radius, order, { ...control, balls: false }).landmarks;
}

/** The maximin net of a plain table from row `start` (none for an empty table). */
export function maximinNet(table: NumericTable, metric: Metric, radius: number, start: number, options: NetOptions = {}): Uint32Array {
  const { index = createRowIndex(table, metric), ...control } = options;
  return table.rows === 0 ? new Uint32Array(0) : maximinBalls(index, radius, start, { ...control, balls: false }).landmarks;
}
