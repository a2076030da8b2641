import type { LandmarkRule } from "../params.ts";
import { checkStop, type RunControl } from "../control.ts";
import { coverFromBalls, type SweepCover } from "./coverFromBalls.ts";
import { isMaximinNet, maximinSequence, prefixBalls, type MaximinSequence } from "./maximinSequence.ts";
import { netWithBalls, type Balls } from "../landmark/netWithBalls.ts";
import type { PreparedRows } from "../search/prepareRows.ts";

/** Receives the cover at radius `index`, in parsed-table rows, and its balls in prepared-table rows. */
export type CoverVisit = (index: number, cover: SweepCover, balls: Balls) => void;

export interface SweepCoversOptions extends RunControl {
  readonly rule: LandmarkRule;
  readonly seed: number;
  /** Called once per radius, in ascending order. */
  readonly visit: CoverVisit;
}

/**
 * Builds the cover at every radius of `radii` (ascending) and hands each to `visit` with its
 * index. What it shares across radii: the rows, selected, scaled and indexed once (`prepared`).
 * What it builds afresh at each radius: the net and its balls, by netWithBalls (the function
 * buildCover calls when it does not run in tree order; one ball query per landmark), the overlap
 * edges, the components and b0/b1 (nerveLoops, as buildCover). The one shortcut: under maximin,
 * the net at a larger radius is taken as a prefix of the smallest radius's farthest-point order
 * (maximinSequence.ts) and kept only when isMaximinNet proves it is the net; otherwise it is
 * built afresh. So each radius's graph equals buildCover's at that radius, which
 * test/core/sweep/equalsBuildCover.test.ts checks. Progress: by radius, 0.8 of each for the net.
 * Cost per radius: L ball queries, O(Σ c²) for the edges and the loops; once: the index, and
 * for maximin O(T²) distances.
 */
export function sweepCovers(prepared: PreparedRows, radii: Float64Array, options: SweepCoversOptions): void {
  const { rule, seed, visit, ...control } = options;
  const { index } = prepared;
  const steps = radii.length;
  let done = 0;
  const part = (from: number, span: number): RunControl => ({
    ...(control.shouldStop ? { shouldStop: control.shouldStop } : {}),
    onProgress: (fraction) => control.onProgress?.((done + from + span * fraction) / steps),
  });
  let sequence: MaximinSequence | null = null;
  for (let k = 0; k < steps; ++k) {
    checkStop(control, "the sweep");
    const radius = radii[k]!;
    let balls: Balls | null = null;
    if (sequence) {
      const prefix = prefixBalls(index, sequence, radius, part(0, 0.8));
      if (isMaximinNet(prefix.landmarks, prefix.rowNodes)) balls = prefix;
    }
    // any rule at the smallest radius, and a maximin prefix that rounding made wrong: as buildCover does
    balls ??= netWithBalls(index, radius, rule, seed, part(0, 0.8));
    if (rule === "maximin" && !sequence) sequence = maximinSequence(index, balls, part(0.8, 0.05));
    visit(k, coverFromBalls(prepared, radius, balls, part(0.85, 0.15)), balls);
    done++;
    control.onProgress?.(done / steps);
  }
}
