import { describe, expect, it } from "vitest";
import { asciiLines, buildCover, coverExportChunks, coverExports, exportChunkLength, parseCsvText, piecesText, randomSource, type CoverParams } from "../../../src/core/index.ts";

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
  it("the pieces of each table, joined, equal coverExports' text byte for byte, with a text id and without an id", () => {
    for (const roles of [context, { ...context, idColumn: null }]) {
      const whole = coverExports(parsed, result, roles);
      const chunks = coverExportChunks(parsed, result, roles);
      for (const name of names) expect(piecesText(chunks[name]()), name).toBe(whole[name]);
    }
  });

  it("members.csv without an id and edges.csv come as ASCII bytes after a header string; decoded as UTF-8 they are the same text", () => {
    const noId = { ...context, idColumn: null };
    const whole = coverExports(parsed, result, noId);
    for (const name of ["members.csv", "edges.csv"] as const) {
      const [header, ...rest] = [...coverExportChunks(parsed, result, noId)[name]()];
      expect(typeof header).toBe("string");
      expect(rest.every((piece) => piece instanceof Uint8Array)).toBe(true);
      expect(`${header as string}${Buffer.concat(rest as Uint8Array[]).toString("utf8")}`).toBe(whole[name]);
    }
  });

  it("members.csv comes in several pieces; each but the last holds at least exportChunkLength (65,536) characters and ends a line", () => {
    const pieces = [...coverExportChunks(parsed, result, context)["members.csv"]()];
    expect(exportChunkLength).toBe(65_536); // 2^16, our choice
    expect(pieces.length).toBeGreaterThan(2);
    for (const piece of pieces.slice(0, -1)) {
      expect(typeof piece).toBe("string"); // with an id column, lines are built as text
      expect(piece.length).toBeGreaterThanOrEqual(exportChunkLength);
      expect(piece.length).toBeLessThan(exportChunkLength + 100); // at most one line past the mark; a line here is under 100 characters
      expect((piece as string).endsWith("\n")).toBe(true);
    }
  });

  it("each call of a table's function starts the table again: two readings give the same text", () => {
    const chunks = coverExportChunks(parsed, result, context);
    expect(piecesText(chunks["edges.csv"]())).toBe(piecesText(chunks["edges.csv"]()));
  });

  it("an unknown id or outcome column throws when the writers are made, before any piece is taken", () => {
    expect(() => coverExportChunks(parsed, result, { ...context, idColumn: "nope" })).toThrow("unknown column: nope");
    expect(() => coverExportChunks(parsed, result, { ...context, outcomes: ["nope"] })).toThrow("unknown column: nope");
  });
});

describe("asciiLines", () => {
  it("writes lines of integers as String() does: 1,0 and 2,10 (the JSDoc example), and 0, 9, 10 and 2^32 − 1", () => {
    const pieces = [...asciiLines(2, 2, 16, (k, cells) => ((cells[0] = k + 1), (cells[1] = 10 * k)))];
    expect(piecesText(pieces)).toBe("1,0\n2,10\n"); // worked by hand
    const values = [0, 9, 10, 99, 100, 999_999_999, 1_000_000_000, 4_294_967_295]; // digit-count edges, and the largest Uint32
    expect(piecesText(asciiLines(values.length, 1, 4, (k, cells) => (cells[0] = values[k]!)))).toBe(values.map((v) => `${v}\n`).join(""));
  });

  it("hands out a piece once it reaches the given size (here 4 bytes: one piece per line of 1,0)", () => {
    const pieces = [...asciiLines(3, 2, 4, (_, cells) => ((cells[0] = 1), (cells[1] = 0)))];
    expect(pieces.map((piece) => piece.length)).toEqual([4, 4, 4]); // "1,0\n" is 4 bytes
  });
});
