import fc from "fast-check";
import type { Metric } from "../../../src/core/index.ts";

/** Puts points into one row-major Float64Array, as a metric reads them (row k is point k). */
export const rowsOf = (...points: readonly (readonly number[])[]): Float64Array => Float64Array.from(points.flat());

/**
 * Coordinates in [−1000, 1000], either 0 or at least 1e-3 in magnitude. Cosine and correlation
 * square and multiply norms (‖x‖²·‖y‖²), which leaves the double range for tiny or huge nonzero
 * rows; that defect has its own tests in normRange.test.ts, so the general checks stay inside the
 * range where the formula is meant to work.
 */
export const coordinate: fc.Arbitrary<number> = fc
  .double({ min: -1e3, max: 1e3, noNaN: true })
  .map((x) => (Object.is(x, -0) ? 0 : x))
  .filter((x) => x === 0 || Math.abs(x) >= 1e-3);

/** `count` points of one random dimension 1..8. */
export const points = (count: number): fc.Arbitrary<number[][]> =>
  fc.integer({ min: 1, max: 8 }).chain((d) => fc.array(fc.array(coordinate, { minLength: d, maxLength: d }), { minLength: count, maxLength: count }));

/** True when the metric is defined on every row of these points (cosine: no zero row; correlation: no constant row). */
export function allDefined(metric: Metric, pts: readonly (readonly number[])[]): boolean {
  const test = metric.isUndefinedRow;
  if (!test) return true;
  const values = rowsOf(...pts);
  const d = pts[0]!.length;
  return pts.every((_, i) => !test(values, d, i));
}

/** `count` points on which `metric` is defined. */
export const definedPoints = (metric: Metric, count: number): fc.Arbitrary<number[][]> => points(count).filter((pts) => allDefined(metric, pts));

/** The largest double below a positive finite x, by decrementing its IEEE 754 bit pattern. */
export function nextDown(x: number): number {
  if (!(x > 0) || !Number.isFinite(x)) throw new Error(`nextDown needs a positive finite number: ${x}`);
  const view = new DataView(new ArrayBuffer(8));
  view.setFloat64(0, x);
  view.setBigUint64(0, view.getBigUint64(0) - 1n);
  return view.getFloat64(0);
}
