/**
 * Control of a long computation: the one progress-callback shape and cancellation. Every long
 * routine of core takes a `RunControl`: it reports the fraction done and asks `shouldStop`
 * between steps, and stops by throwing `Cancelled`.
 */

/** Thrown by a long computation when its caller asked it to stop; not a failure of the input. */
export class Cancelled extends Error {
  constructor(what = "the computation") {
    super(`${what} was cancelled`);
    this.name = "Cancelled";
  }
}

export function isCancelled(error: unknown): error is Cancelled {
  return error instanceof Error && (error.name === "Cancelled" || error.name === "CancelledError");
}

/** Progress and cancellation hooks of a long computation; both optional. */
export interface RunControl {
  /** Fraction done, 0..1, nondecreasing. */
  readonly onProgress?: (fraction: number) => void;
  /** Asked between steps and every few thousand rows inside long loops; true stops the run with a Cancelled error. */
  readonly shouldStop?: () => boolean;
}

/**
 * A run made of named phases (the build): `onPhase` announces each phase as it starts, and the
 * fractions `onProgress` reports after it are of that phase, from 0 to 1.
 */
export interface PhasedControl<Phase extends string> extends RunControl {
  readonly onPhase?: (phase: Phase) => void;
}

/**
 * The cancel-only hook of loops that report no progress (reading, scaling, building the tree):
 * called now and then, it throws core's Cancelled error to stop. A RunControl gives one as
 * `() => checkStop(control, what)`.
 */
export type StepHook = () => void;

/** Throws core's Cancelled error ("<what> was cancelled") when the control says stop. */
export function checkStop(control: RunControl, what: string): void {
  if (control.shouldStop?.()) throw new Cancelled(what);
}

/** The control of a part of a run spanning fractions [from, from + span] of the whole: the same stop, progress rescaled. */
export function partOf(control: RunControl, from: number, span: number): RunControl {
  const { onProgress, shouldStop } = control;
  return { ...(shouldStop ? { shouldStop } : {}), ...(onProgress ? { onProgress: (fraction: number) => onProgress(from + span * fraction) } : {}) };
}

/** A lap timer over a clock: each call returns the time since the previous call (or since the timer was made). */
export function lapClock(now: () => number): () => number {
  let last = now();
  return () => {
    const t = now();
    const elapsed = t - last;
    last = t;
    return elapsed;
  };
}
