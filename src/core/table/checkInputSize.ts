import { maxInputBytes } from "./readOptions.ts";

/**
 * Throws when a file is larger than the reader's budget, before any of it is read; call it with
 * the file's size in bytes. The budget is `maxInputBytes` (1 GiB) unless another is given: the
 * workbench keeps 1 GiB (the tab's memory), the headless command passes `Infinity` (its memory is
 * the machine's; see `headlessInputBytes` in src/cli/readInput.ts).
 * @example checkInputSize(2 ** 31) // throws "the file is too large: 2.00 GiB (the limit is 1 GiB)"
 */
export function checkInputSize(bytes: number, limit: number = maxInputBytes): void {
  if (!(bytes >= 0)) throw new Error(`invalid file size: ${bytes}`);
  if (!(limit >= 0)) throw new Error(`invalid size limit: ${limit}`);
  if (bytes > limit) throw new Error(`the file is too large: ${(bytes / 2 ** 30).toFixed(2)} GiB (the limit is ${limit / 2 ** 30} GiB)`);
}
