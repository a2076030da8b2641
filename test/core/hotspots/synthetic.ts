import { randomSource, type ParsedTable } from "../../../src/core/index.ts";

/** Standard normal draws by the Box–Muller transform (Box and Muller, Ann Math Stat 29:610, 1958) from the seeded generator. */
export function normalDraws(count: number, random: () => number): Float64Array {
  const out = new Float64Array(count);
  for (let i = 0; i < count; i += 2) {
    const u = 1 - random(); // in (0, 1]: the logarithm stays finite
    const v = random();
    const radius = Math.sqrt(-2 * Math.log(u));
    out[i] = radius * Math.cos(2 * Math.PI * v);
    if (i + 1 < count) out[i + 1] = radius * Math.sin(2 * Math.PI * v);
  }
  return out;
}

/**
 * An invented table: `features` standard normal columns f1, f2, … and an outcome column "y" made
 * by `outcome(columns, random)` from the same seeded stream, after the features.
 */
export function syntheticTable(rows: number, features: number, seed: number, outcome: (columns: readonly Float64Array[], random: () => number) => Float64Array): ParsedTable {
  const random = randomSource(seed);
  const values = Array.from({ length: features }, () => normalDraws(rows, random));
  const column = (name: string, numbers: Float64Array) => ({ name, kind: "numeric" as const, numbers, texts: null, missing: 0 });
  return { rows, columns: [...values.map((numbers, j) => column(`f${j + 1}`, numbers)), column("y", outcome(values, random))] };
}

/** The `count` rows nearest to row `centre` in plain Euclidean distance over the columns (ties to the lower row), ascending: a ball holding them. */
export function ballAround(columns: readonly Float64Array[], centre: number, count: number): Uint32Array {
  const rows = columns[0]!.length;
  const distance = Float64Array.from({ length: rows }, (_, i) => columns.reduce((sum, column) => sum + (column[i]! - column[centre]!) ** 2, 0));
  const order = Array.from({ length: rows }, (_, i) => i).sort((a, b) => distance[a]! - distance[b]! || a - b);
  return Uint32Array.from(order.slice(0, count)).sort();
}
