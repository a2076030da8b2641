import type { ParsedTable } from "../table/types.ts";
import { partOf, type RunControl } from "../control.ts";
import { coverFigures } from "./coverFigures.ts";
import type { SweepCover } from "./coverFromBalls.ts";
import { defaultRange, defaultRangeRule } from "../radius/defaultRange.ts";
import { ascendingRadii, logSpacedRadii } from "./logSpacedRadii.ts";
import type { Balls } from "../landmark/netWithBalls.ts";
import { plateaus, type Plateau } from "../radius/plateaus.ts";
import { prepareRows, type PreparedRows, type SweepParams } from "../search/prepareRows.ts";
import { plateauMiddle, plateauMiddleRule, type PlateauMiddle } from "../radius/plateauMiddle.ts";
import { sweepCovers } from "./sweepCovers.ts";
import { emptyFigures, setFigures, type SweepFigures } from "./sweepFigures.ts";

export const defaultSweepSteps = 24; // issue 6

export interface SweepOptions extends RunControl {
  /** Explicit radii (any order, duplicates dropped); when given, radiusMin, radiusMax and steps are ignored. */
  readonly radii?: ArrayLike<number>;
  /** Ends of a log-spaced sweep; an end left out comes from the default range rule. */
  readonly radiusMin?: number;
  readonly radiusMax?: number;
  /** Number of log-spaced radii, at least 2 (default 24). */
  readonly steps?: number;
  /** The radius on screen: the default range is widened to contain it unless the graph there passes the range's node cap of 2,000. */
  readonly current?: number;
  /** Receives each radius's whole cover (index into the ascending radii) and its balls in prepared-table rows. */
  readonly onCover?: (index: number, cover: SweepCover, balls: Balls) => void;
  /** Clock for `timings` (core has no `performance`); default Date.now. */
  readonly now?: () => number;
}

export interface RadiusSweep {
  readonly params: SweepParams;
  readonly rowsRead: number;
  readonly rowsUsed: number;
  /** The swept range; `rule` states the default range rule when an end came from it, else null. */
  readonly range: { readonly min: number; readonly max: number; readonly rule: string | null };
  readonly figures: SweepFigures;
  /** Runs of consecutive radii with unchanged b0 and b1, ascending. */
  readonly plateaus: readonly Plateau[];
  /** The plateau middle (field name kept for the readers in cli/ and ui/). */
  readonly suggestion: PlateauMiddle | null;
  /** The plateau-middle rule in plain words. */
  readonly suggestionRule: string;
  /** Milliseconds by `now`: selecting, scaling and indexing the rows, finding the default range, building the covers. */
  readonly timings: { readonly prepare: number; readonly range: number; readonly covers: number };
}

/**
 * Radius-stability sweep: the cover graph at each of a list of radii, with the figures of each
 * (nodes, edges, b0, b1, cycle rank, balls per row, largest node's and largest component's shares
 * of the rows), its plateaus of unchanged (b0, b1) and its plateau middle (radius/plateauMiddle.ts).
 * Every radius's graph equals buildCover's at that radius: the rows are selected, scaled and
 * indexed once (search/prepareRows.ts), and each radius's net and balls come from the same
 * netWithBalls as the build's (landmark/netWithBalls.ts), except that maximin nets above the
 * smallest radius are taken as prefixes of one farthest-point order when a check proves them
 * equal (maximinSequence.ts); b1 comes from nerveLoops, as in the build. Default radii: 24
 * log-spaced over the default range (radius/defaultRange.ts), widened to contain `current`.
 * Progress goes to `onProgress` (a tenth for the range when it is computed, the rest by radius);
 * `shouldStop` is asked between radii and inside long loops and stops the run with core's
 * Cancelled error (control.ts). Cost: see sweepCovers.
 * @example radiusSweep(24 points evenly on a circle, { features: ["x", "y"], scale: "none", … }, { radii: logSpacedRadii(0.05, 3, 24) }).figures.b1[10] // => 1
 */
export function radiusSweep(parsed: ParsedTable, params: SweepParams, options: SweepOptions = {}): RadiusSweep {
  const now = options.now ?? Date.now;
  const started = now();
  const prepared = prepareRows(parsed, params, options);
  return sweepPrepared(prepared, parsed.rows, params, options, now() - started);
}

/** radiusSweep on rows already prepared (prepareRows) from a table of `rowsRead` rows, which took `prepareTime` ms. */
export function sweepPrepared(prepared: PreparedRows, rowsRead: number, params: SweepParams, options: SweepOptions = {}, prepareTime = 0): RadiusSweep {
  const { now = Date.now, onCover } = options;
  const started = now();
  const part = (from: number, span: number): RunControl => partOf(options, from, span);
  let rule: string | null = null;
  let radii: Float64Array;
  let rangeShare = 0;
  if (options.radii) radii = ascendingRadii(options.radii);
  else {
    let { radiusMin: min, radiusMax: max } = options;
    if (min === undefined || max === undefined) {
      rangeShare = 0.1;
      const found = defaultRange(prepared, { ...part(0, rangeShare), ...(options.current === undefined ? {} : { current: options.current }) });
      min ??= found.min;
      max ??= found.max;
      rule = defaultRangeRule;
    }
    radii = logSpacedRadii(min, max, options.steps ?? defaultSweepSteps);
  }
  const rangeTime = now() - started;
  const figures = emptyFigures(radii);
  sweepCovers(prepared, radii, {
    ...part(rangeShare, 1 - rangeShare),
    rule: params.landmarks,
    seed: params.seed,
    visit: (k, cover, balls) => {
      setFigures(figures, k, coverFigures(cover, balls.rowNodes));
      onCover?.(k, cover, balls);
    },
  });
  return {
    params: { ...params, features: [...params.features] },
    rowsRead,
    rowsUsed: prepared.table.rows,
    range: { min: radii[0]!, max: radii[radii.length - 1]!, rule },
    figures,
    plateaus: plateaus(radii, figures.b0, figures.b1),
    suggestion: plateauMiddle(radii, figures),
    suggestionRule: plateauMiddleRule,
    timings: { prepare: prepareTime, range: rangeTime, covers: now() - started - rangeTime },
  };
}
