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
