// The headless command reads files past the workbench's 1 GiB limit. A sparse file of 2 GiB
// (truncate makes one without writing its bytes) shows which limit applies without a huge file:
// it holds only NUL bytes, so a reader that gets past the size check stops at the binary-file check.
import { mkdtempSync, rmSync, truncateSync, writeFileSync } from "node:fs";
import { open } from "node:fs/promises";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { fileSource, headlessInputBytes, readInput, utf8 } from "../../src/cli/readInput.ts";
import { readTableBytes } from "../../src/core/index.ts";

const scratch = mkdtempSync(join(tmpdir(), "shoal-read-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));
const sparse = join(scratch, "two-gib.csv");
writeFileSync(sparse, "");
truncateSync(sparse, 2 ** 31); // 2 GiB of NUL bytes, sparse

describe("the headless command's file-size limit", () => {
  it("is none: headlessInputBytes is Infinity", () => {
    expect(headlessInputBytes).toBe(Number.POSITIVE_INFINITY);
  });

  // Before the limit was lifted, readInput refused this file with "the file is too large: 2.00 GiB (the limit is 1 GiB)".
  it("readInput reads past 1 GiB: a 2 GiB file of NULs fails as binary, not as too large", async () => {
    await expect(readInput(sparse, {})).rejects.toThrow("this looks like a binary file: it has NUL bytes in its first 1 KiB");
  });

  it("the workbench's reading (readTableBytes without maxBytes) still refuses the same file at 1 GiB", async () => {
    const handle = await open(sparse, "r");
    try {
      await expect(readTableBytes(fileSource(handle, 2 ** 31), {}, { utf8 })).rejects.toThrow("the file is too large: 2.00 GiB (the limit is 1 GiB)");
    } finally {
      await handle.close();
    }
  });
});
