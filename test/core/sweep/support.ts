import type { CompressedLists, ParsedTable } from "../../../src/core/index.ts";
import type { SweepCover } from "../../../src/core/sweep/coverFromBalls.ts";
import { radiusSweep, type RadiusSweep, type SweepOptions } from "../../../src/core/sweep/radiusSweep.ts";
import type { SweepParams } from "../../../src/core/search/prepareRows.ts";

/** A parsed table straight from rows of numbers (NaN marks a missing cell); every column numeric. */
export function pointsTable(names: readonly string[], rows: readonly (readonly number[])[]): ParsedTable {
  return {
    rows: rows.length,
    columns: names.map((name, j) => {
      const numbers = Float64Array.from(rows, (row) => row[j]!);
      return { name, kind: "numeric" as const, numbers, texts: null, missing: numbers.filter(Number.isNaN).length };
    }),
  };
}

/** The lists of compressed lists, as plain arrays. */
export function lists(compressed: CompressedLists): number[][] {
  return Array.from({ length: compressed.offsets.length - 1 }, (_, k) => Array.from(compressed.items.subarray(compressed.offsets[k]!, compressed.offsets[k + 1]!)));
}

/** A sweep and every cover it built, by index into its ascending radii. */
export function sweepWithCovers(parsed: ParsedTable, params: SweepParams, options: SweepOptions): { sweep: RadiusSweep; covers: SweepCover[] } {
  const covers: SweepCover[] = [];
  const sweep = radiusSweep(parsed, params, { ...options, onCover: (k, cover) => (covers[k] = cover) });
  return { sweep, covers };
}
