import { createHash } from "node:crypto";
import { readFile } from "node:fs/promises";
import { describe, expect, it } from "vitest";
import { createHandler } from "../../src/worker/handle.ts";
import type { Answer } from "../../src/worker/protocol.ts";

// The load answer's fingerprint covers every byte of the file once, in order, whatever way it is read.
const sha = (bytes: Uint8Array | string): string => createHash("sha256").update(bytes).digest("hex"); // node:crypto, reference library
const fingerprintOf = async (source: { kind: "file"; file: Blob } | { kind: "text"; text: string }) => {
  const answer: Answer = await createHandler()({ id: 1, type: "load", source, options: {} }, () => {});
  if (answer.type !== "loaded") throw new Error(`expected loaded, got ${JSON.stringify(answer)}`);
  return answer.fingerprint;
};

describe("worker: the load answer's fingerprint", () => {
  for (const name of ["bom-utf8.tsv", "semicolon-decimal-comma-1252.csv", "mixed-columns.parquet"]) {
    it(`${name}: node:crypto's SHA-256 of the file and its size (byte-order mark and Parquet included)`, async () => {
      const bytes = new Uint8Array(await readFile(new URL(`../fixtures/${name}`, import.meta.url)));
      expect(await fingerprintOf({ kind: "file", file: new Blob([bytes]) })).toEqual({ bytes: bytes.length, sha256: sha(bytes) });
    });
  }

  it("a file of several 4 MiB read steps is hashed whole", async () => {
    const text = `a,b\n${Array.from({ length: 1_000_000 }, (_, i) => `${i},${i % 7}`).join("\n")}\n`;
    const bytes = new TextEncoder().encode(text);
    expect(bytes.length).toBeGreaterThan(2 * (1 << 22)); // at least three read steps
    expect(await fingerprintOf({ kind: "file", file: new Blob([bytes]) })).toEqual({ bytes: bytes.length, sha256: sha(bytes) });
  });

  it("text in memory (the demo) is hashed as its UTF-8 bytes, as the same file on disk would be", async () => {
    const text = "a,b\n1,2\n3,4\n";
    expect(await fingerprintOf({ kind: "text", text })).toEqual({ bytes: 12, sha256: sha(text) });
  });
});
