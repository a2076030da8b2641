import { describe, expect, it } from "vitest";
import { buildCover, coverExportChunks, coverExports, exportChunkLength, parseCsvText, randomSource, type CoverParams } from "../../../src/core/index.ts";

// 6,000 rows on a seeded line with a text id and an outcome: members.csv runs to well over 65,536
// characters, so each large table comes in several pieces.
const random = randomSource(11);
const csv = `id,x,y\n${Array.from({ length: 6000 }, (_, i) => `=r${i},${(random() * 100).toFixed(6)},${i % 7}`).join("\n")}\n`;
const parsed = parseCsvText(csv);
const params: CoverParams = { features: ["x"], scale: "none", metric: "euclidean", radius: 0.2, landmarks: "greedy-file-order", seed: 1 };
const result = buildCover(parsed, params);
const context = { fileName: "line.csv", fileSize: csv.length, idColumn: "id", outcomes: ["y"] } as const;
const names = ["nodes.csv", "members.csv", "edges.csv"] as const;

describe("coverExportChunks", () => {
  it("the pieces of each table, joined, equal coverExports' text byte for byte", () => {
    const whole = coverExports(parsed, result, context);
    const chunks = coverExportChunks(parsed, result, context);
    for (const name of names) expect([...chunks[name]()].join(""), name).toBe(whole[name]);
  });

  it("members.csv comes in several pieces; each but the last holds at least exportChunkLength (65,536) characters and ends a line", () => {
    const pieces = [...coverExportChunks(parsed, result, context)["members.csv"]()];
    expect(exportChunkLength).toBe(65_536); // 2^16, our choice
    expect(pieces.length).toBeGreaterThan(2);
    for (const piece of pieces.slice(0, -1)) {
      expect(piece.length).toBeGreaterThanOrEqual(exportChunkLength);
      expect(piece.length).toBeLessThan(exportChunkLength + 100); // at most one line past the mark; a line here is under 100 characters
      expect(piece.endsWith("\n")).toBe(true);
    }
  });

  it("each call of a table's function starts the table again: two readings give the same pieces", () => {
    const chunks = coverExportChunks(parsed, result, context);
    expect([...chunks["edges.csv"]()]).toEqual([...chunks["edges.csv"]()]);
  });

  it("an unknown id or outcome column throws when the writers are made, before any piece is taken", () => {
    expect(() => coverExportChunks(parsed, result, { ...context, idColumn: "nope" })).toThrow("unknown column: nope");
    expect(() => coverExportChunks(parsed, result, { ...context, outcomes: ["nope"] })).toThrow("unknown column: nope");
  });
});
