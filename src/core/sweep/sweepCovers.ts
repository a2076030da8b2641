import type { LandmarkRule } from "../params.ts";
import { checkStop, type RunControl } from "../control.ts";
import { coverFromBalls, type SweepCover } from "./coverFromBalls.ts";
import { isMaximinNet, maximinSequence, prefixBalls, type MaximinSequence } from "./maximinSequence.ts";
import { netWithBalls, type Balls } from "../landmark/netWithBalls.ts";
import type { PreparedRows } from "../search/prepareRows.ts";

/** Receives the cover at radius `index`, in parsed-table rows, and its balls in prepared-table rows. */
export type CoverVisit = (index: number, cover: SweepCover, balls: Balls) => void;

/**
 * Builds the cover at every radius of `radii` (ascending) and hands each to `visit` with its
 * index. Landmarks, balls and edges equal buildCover's at that radius: rows are scaled and
 * indexed once (`prepared`), each net and its balls come from buildCover's own calls
 * (netWithBalls.ts), except that maximin nets above the smallest radius are taken as prefixes
 * of the smallest radius's farthest-point order and checked (maximinSequence.ts), and b1 comes
 * from nerveLoops (equal to nerveBetti's, faster). Cost per radius: L ball queries, O(Σ c²) for
 * the edges and the loops; once: scaling, the index, and for maximin O(T²) distances.
 */
export function sweepCovers(prepared: PreparedRows, radii: Float64Array, rule: LandmarkRule, seed: number, visit: CoverVisit, control: RunControl = {}): void {
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
