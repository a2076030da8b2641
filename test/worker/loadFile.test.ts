import { readFile } from "node:fs/promises";
import { describe, expect, it } from "vitest";
import { createHandler } from "../../src/worker/handle.ts";
import type { Answer, Progress } from "../../src/worker/protocol.ts";

// The worker reads dropped files through the same core pipeline as the headless command
// (readTableBytes): encoding and format detection, streaming in chunks, progress, cancellation.
const fixture = async (name: string): Promise<Blob> => new Blob([await readFile(new URL(`../fixtures/${name}`, import.meta.url))]);
const loaded = (answer: Answer) => {
  if (answer.type !== "loaded") throw new Error(`expected loaded, got ${JSON.stringify(answer)}`);
  return answer;
};

describe("worker: loading a file", () => {
  it("a Windows-1252 file with ';' and decimal commas reads as numbers, with the format in the report (fixture README)", async () => {
    const answer = loaded(await createHandler()({ id: 1, type: "load", source: { kind: "file", file: await fixture("semicolon-decimal-comma-1252.csv") }, options: {} }, () => {}));
    expect(answer.report.format).toMatchObject({ kind: "delimited", delimiter: ";", decimal: "," });
    expect(answer.table.rows).toBe(5); // 5 records (test/fixtures/README.md)
    expect(answer.table.columns.some((c) => c.kind === "numeric")).toBe(true);
  });

  it("a UTF-8 TSV with a byte-order mark loads 3 records and its first column name has no BOM (fixture README)", async () => {
    const answer = loaded(await createHandler()({ id: 1, type: "load", source: { kind: "file", file: await fixture("bom-utf8.tsv") }, options: {} }, () => {}));
    expect(answer.table.rows).toBe(3);
    expect(answer.table.columns[0]!.name.charCodeAt(0)).not.toBe(0xfeff);
  });

  it("a Parquet file is recognised by its magic bytes and reads 6 rows (fixture README)", async () => {
    const answer = loaded(await createHandler()({ id: 1, type: "load", source: { kind: "file", file: await fixture("mixed-columns.parquet") }, options: {} }, () => {}));
    expect(answer.report.format.kind).toBe("parquet");
    expect(answer.table.rows).toBe(6);
  });

  it("a large file reports increasing progress and is read in several chunks", async () => {
    const lines = Array.from({ length: 1_000_000 }, (_, i) => `${i},${i % 7}`).join("\n");
    const file = new Blob([`a,b\n${lines}\n`]);
    const reports: Progress[] = [];
    const answer = loaded(await createHandler({ progressInterval: 0 })({ id: 1, type: "load", source: { kind: "file", file }, options: {} }, (p) => reports.push(p)));
    expect(answer.table.rows).toBe(1_000_000);
    expect(reports.length).toBeGreaterThan(1); // more than one 4 MiB chunk
    for (let k = 1; k < reports.length; ++k) expect(reports[k]!.fraction).toBeGreaterThanOrEqual(reports[k - 1]!.fraction);
  });

  it("a load cancelled during reading answers 'cancelled' and keeps the previous table", async () => {
    let stop = false;
    const handle = createHandler({ isStopped: (request) => stop && request.type === "load", progressInterval: 0 });
    await handle({ id: 1, type: "load", source: { kind: "text", text: "x\n1\n2\n" }, options: {} }, () => {});
    const big = new Blob([`a\n${Array.from({ length: 3_000_000 }, (_, i) => i).join("\n")}\n`]);
    const answer = await handle({ id: 2, type: "load", source: { kind: "file", file: big }, options: {} }, () => (stop = true));
    expect(answer).toEqual({ id: 2, type: "cancelled" });
    const built = await handle({ id: 3, type: "build", params: { features: ["x"], scale: "none", metric: "euclidean", radius: 1, landmarks: "greedy-file-order", seed: 1 } }, () => {});
    expect(built).toMatchObject({ type: "built", result: { rowsRead: 2 } }); // still the first table
  });

  it("bytes that are not UTF-8 after the first 64 KiB give one error suggesting windows-1252", async () => {
    const ascii = new TextEncoder().encode(`a,b\n${"1,2\n".repeat(20_000)}`);
    const bad = Uint8Array.of(0x33, 0x2c, 0xe9, 0x0a); // "3,é" in Windows-1252: 0xE9 alone is not UTF-8
    const answer = await createHandler()({ id: 1, type: "load", source: { kind: "file", file: new Blob([ascii, bad]) }, options: {} }, () => {});
    expect(answer.type).toBe("failed");
    if (answer.type === "failed") expect(answer.message).toMatch(/^the file is not valid utf-8 near byte \d+: choose windows-1252/);
  });
});

describe("worker: a file load that fails after reading", () => {
  it("a throw while keeping the read table (share) answers 'failed' with its message instead of rejecting", async () => {
    const handle = createHandler({ share: () => { throw new Error("out of shared memory"); } });
    const answer = await handle({ id: 1, type: "load", source: { kind: "file", file: new Blob(["x\n1\n2\n"]) }, options: {} }, () => {});
    expect(answer).toEqual({ id: 1, type: "failed", message: "out of shared memory" });
  });
});
