import { Cancelled } from "../cancel.ts";
import { benjaminiHochberg } from "../stats/benjaminiHochberg.ts";
import type { ParsedTable } from "../table/types.ts";
import { compareCategorical, type CategoricalComparison } from "./compareCategorical.ts";
import { compareNumeric, type NumericComparison } from "./compareNumeric.ts";
import type { RegionSides } from "./regionSides.ts";

/** One line of the region table: a numeric column (Kolmogorov–Smirnov) or a categorical one (chi-squared). */
export type RegionTableLine =
  | ({ readonly column: string; readonly kind: "numeric"; readonly test: "ks"; readonly pAdjusted: number } & NumericComparison)
  | ({ readonly column: string; readonly kind: "categorical"; readonly test: "chi2"; readonly pAdjusted: number } & CategoricalComparison);

export interface RegionTable {
  /** Rows on each side (before missing values, which each line leaves out for itself). */
  readonly rowsInside: number;
  readonly rowsOutside: number;
  /** Rows read that the build left out; region rows among them; used rows in both regions (A vs B). */
  readonly rowsUnused: number;
  readonly regionRowsUnused: number;
  readonly inBoth: number;
  /** Numeric lines by D, largest first, then categorical lines by p, smallest first (NaN last). */
  readonly lines: readonly RegionTableLine[];
  /** Columns not tested, with the reason: identifier-like (every value distinct) or empty. */
  readonly skipped: readonly { readonly column: string; readonly reason: "identifier" | "empty" }[];
}

export interface RegionTableOptions {
  /** The row-label column, never tested; null for none. */
  readonly labelColumn: string | null;
  /** Columns done and the column count; a throw from it (core's Cancelled) stops the table. */
  readonly onProgress?: (done: number, total: number) => void;
  readonly shouldStop?: () => boolean;
}

/**
 * What sets a region apart: for every column but the row label, inside against outside (the sides
 * of `regionSides`): counts, means, medians, Cohen's d and the two-sample Kolmogorov–Smirnov D with
 * its p-value for a numeric column; level shares and Pearson's chi-squared test for a categorical
 * one; then Benjamini–Hochberg adjusted p-values over all the lines (Y. Benjamini and Y. Hochberg,
 * J. R. Stat. Soc. B 57(1):289–300, 1995).
 * The region was chosen by looking at this same data, so these p-values describe how far apart the
 * sides are; they are not confirmatory tests and are small more often than their nominal level.
 * Cost: O(columns · n log n), plus O(m·n) per column where the exact KS p-value applies (m·n ≤ 10,000).
 * Degenerate input: an empty side gives NaN figures (and NaN p, which BH leaves out).
 * @example regionTable(parseCsvText("x\n1\n2\n3\n2\n4\n"), regionSides(5, Uint32Array.of(0, 1, 2, 3, 4), [0, 1, 2]), { labelColumn: null }).lines[0]!.statistic // => 0.5
 */
export function regionTable(parsed: ParsedTable, sides: RegionSides, options: RegionTableOptions): RegionTable {
  const { labelColumn, onProgress, shouldStop } = options;
  const numeric: Omit<Extract<RegionTableLine, { kind: "numeric" }>, "pAdjusted">[] = [];
  const categorical: Omit<Extract<RegionTableLine, { kind: "categorical" }>, "pAdjusted">[] = [];
  const skipped: RegionTable["skipped"][number][] = [];
  const columns = parsed.columns.filter((c) => c.name !== labelColumn);
  columns.forEach((column, k) => {
    if (shouldStop?.()) throw new Cancelled("the region table");
    if (column.kind === "numeric") numeric.push({ column: column.name, kind: "numeric", test: "ks", ...compareNumeric(column.numbers, sides.inside, sides.outside) });
    else if (column.categories) categorical.push({ column: column.name, kind: "categorical", test: "chi2", ...compareCategorical(column.categories, sides.inside, sides.outside) });
    else skipped.push({ column: column.name, reason: column.type === "empty" ? "empty" : "identifier" });
    onProgress?.(k + 1, columns.length);
  });
  numeric.sort((a, b) => descendingNaNLast(a.statistic, b.statistic));
  categorical.sort((a, b) => descendingNaNLast(-a.p, -b.p));
  const ordered = [...numeric, ...categorical];
  const adjusted = benjaminiHochberg(ordered.map((line) => line.p));
  return {
    rowsInside: sides.inside.length,
    rowsOutside: sides.outside.length,
    rowsUnused: sides.rowsUnused,
    regionRowsUnused: sides.regionRowsUnused,
    inBoth: sides.inBoth,
    lines: ordered.map((line, k) => ({ ...line, pAdjusted: adjusted[k]! }) as RegionTableLine),
    skipped,
  };
}

// Array.prototype.sort is stable, so equal keys keep the table's column order.
function descendingNaNLast(a: number, b: number): number {
  if (a !== a) return b !== b ? 0 : 1;
  if (b !== b) return -1;
  return b - a;
}
