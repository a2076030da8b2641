import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { writeBatchBytes, writeTextFile } from "../../src/cli/writeTextFile.ts";

const scratch = mkdtempSync(join(tmpdir(), "shoal-text-"));
afterAll(() => rmSync(scratch, { recursive: true, force: true }));

describe("writeTextFile", () => {
  it("writes strings as UTF-8 and bytes as they are, in order: \"é,\" then the bytes of \"1\\n\" give c3 a9 2c 31 0a", async () => {
    const path = join(scratch, "mixed.csv");
    await writeTextFile(path, ["é,", Uint8Array.of(0x31, 0x0a)]);
    expect([...readFileSync(path)]).toEqual([0xc3, 0xa9, 0x2c, 0x31, 0x0a]); // é is U+00E9, c3 a9 in UTF-8 (RFC 3629)
  });

  it("pieces adding up to more than one 4 MiB batch, multi-byte characters included, give the same bytes as the joined text", async () => {
    expect(writeBatchBytes).toBe(4 * 2 ** 20); // 4 MiB, our choice
    const pieces = Array.from({ length: 60 }, (_, i) => `${i},${"ü€𝄞".repeat(10_000)}\n`); // 2-, 3- and 4-byte characters
    const path = join(scratch, "many.csv");
    await writeTextFile(path, pieces);
    const expected = Buffer.from(pieces.join(""), "utf8");
    expect(expected.length).toBeGreaterThan(writeBatchBytes);
    expect(readFileSync(path).equals(expected)).toBe(true);
  });

  it("a piece longer than the batch buffer (a 5 MiB string) is written whole between smaller ones", async () => {
    const big = "x".repeat(5 * 2 ** 20);
    const path = join(scratch, "big.csv");
    await writeTextFile(path, ["a\n", big, Uint8Array.of(0x62, 0x0a)]);
    expect(readFileSync(path, "utf8")).toBe(`a\n${big}b\n`);
  });

  it("a piece that throws ends the write with its error", async () => {
    function* failing(): Generator<string> {
      yield "a\n";
      throw new Error("export failed");
    }
    await expect(writeTextFile(join(scratch, "failed.csv"), failing())).rejects.toThrow("export failed");
  });
});
