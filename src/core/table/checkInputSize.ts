import { maxInputBytes } from "./readOptions.ts";

/**
 * Throws when a file is larger than the reader's budget (`maxInputBytes`, 1 GiB), before any of
 * it is read; call it with the file's size in bytes.
 * @example checkInputSize(2 ** 31) // throws "the file is too large: 2.00 GiB (the limit is 1 GiB)"
 */
export function checkInputSize(bytes: number): void {
  if (!(bytes >= 0)) throw new Error(`invalid file size: ${bytes}`);
  if (bytes > maxInputBytes) throw new Error(`the file is too large: ${(bytes / 2 ** 30).toFixed(2)} GiB (the limit is 1 GiB)`);
}
