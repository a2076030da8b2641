import { Cancelled } from "../cancel.ts";

/** Progress and cancellation hooks of a long computation; both optional. */
export interface RunControl {
  /** Fraction done, 0..1, nondecreasing. */
  readonly onProgress?: (fraction: number) => void;
  /** Asked between steps and every few thousand rows inside long loops; true stops the run with a Cancelled error. */
  readonly shouldStop?: () => boolean;
}

/** Throws core's Cancelled error ("<what> was cancelled") when the control says stop. */
export function checkStop(control: RunControl, what: string): void {
  if (control.shouldStop?.()) throw new Cancelled(what);
}
