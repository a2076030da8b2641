import { sha256 } from "@noble/hashes/sha2.js";
import { bytesToHex } from "@noble/hashes/utils.js";

/** A file's fingerprint: its size in bytes and the SHA-256 of its bytes as 64 lowercase hex digits. */
export interface FileFingerprint {
  readonly bytes: number;
  readonly sha256: string;
}

/** A hash fed the file's bytes in order, chunk by chunk, so the whole file is never needed in memory. */
export interface IncrementalFingerprint {
  update(chunk: Uint8Array): void;
  finish(): FileFingerprint;
}

/**
 * SHA-256 (FIPS 180-4) over a file read in steps, through @noble/hashes (pure JavaScript, so the
 * same in a worker and in Node). O(bytes).
 * @example const f = createFingerprint(); f.update(new TextEncoder().encode("abc")); f.finish().sha256 // => "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad"
 */
export function createFingerprint(): IncrementalFingerprint {
  const hash = sha256.create();
  let bytes = 0;
  return {
    update(chunk) {
      hash.update(chunk);
      bytes += chunk.length;
    },
    finish: () => ({ bytes, sha256: bytesToHex(hash.digest()) }),
  };
}
