import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { createFingerprint, isRecipeInput, otherFileLine } from "../../../src/core/index.ts";

describe("createFingerprint", () => {
  it('SHA-256 of "abc" is ba7816bf…15ad (FIPS 180-2, appendix B.1)', () => {
    const f = createFingerprint();
    f.update(new TextEncoder().encode("abc"));
    expect(f.finish()).toEqual({ bytes: 3, sha256: "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad" });
  });

  it("SHA-256 of no bytes is e3b0c442…b855 (the published empty-input value, FIPS 180-2 examples)", () => {
    expect(createFingerprint().finish()).toEqual({ bytes: 0, sha256: "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855" });
  });

  it("hashing in uneven chunks gives node:crypto's digest of the whole (reference library)", () => {
    const bytes = Uint8Array.from({ length: 10_001 }, (_, k) => (k * 31 + 7) & 255);
    const f = createFingerprint();
    for (const [start, end] of [[0, 1], [1, 4096], [4096, 4097], [4097, 10_001]] as const) f.update(bytes.subarray(start, end));
    expect(f.finish()).toEqual({ bytes: 10_001, sha256: createHash("sha256").update(bytes).digest("hex") });
  });
});

describe("isRecipeInput and otherFileLine", () => {
  const input = { name: "a.csv", bytes: 3, sha256: "1".repeat(64) };
  it("the same bytes under another name are the recipe's input", () => {
    expect(isRecipeInput(input, { bytes: 3, sha256: "1".repeat(64) })).toBe(true);
    expect(isRecipeInput(input, { bytes: 3, sha256: "2".repeat(64) })).toBe(false);
  });
  it("the line names both files and both fingerprints", () => {
    expect(otherFileLine(input, "b.csv", { bytes: 4, sha256: "2".repeat(64) })).toBe(
      `the recipe was made on a.csv (sha256 ${"1".repeat(64)}, 3 bytes), not on this file b.csv (sha256 ${"2".repeat(64)}, 4 bytes)`,
    );
  });
});
