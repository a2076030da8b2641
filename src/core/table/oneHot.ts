import { missingCode } from "./finishColumn.ts";
import type { Categories, NumericTable } from "./types.ts";

export interface OneHotOptions {
  /** Column name; the indicator columns are called `${name}=${level}`. */
  readonly name: string;
  /** Value of an indicator that is on (default 1). */
  readonly weight?: number;
  /** Rows to encode (0-based, e.g. a selection's usedRows); default every row. */
  readonly rows?: ArrayLike<number>;
}

/**
 * One-hot (indicator) encoding of a categorical column: one column per level, holding `weight`
 * where the row has that level and 0 elsewhere; a row with no level gets NaN in every indicator
 * (so the missing-value policy sees it). Two rows with different levels then lie at Euclidean
 * distance w·√2, Manhattan 2w and Chebyshev w; rows with the same level at 0. Join the result
 * to the features after scaling: z-scoring indicators would stretch rare levels by 1/√(p(1 − p)).
 * Source: the usual dummy coding, e.g. Hastie, Tibshirani & Friedman, The Elements of Statistical
 * Learning, 2nd ed., 2009, §2.3. O(rows · levels).
 * @example oneHot({ codes: Uint32Array.of(0, 1, 0), levels: ["a", "b"] }, { name: "g" }).values // => [1, 0, 0, 1, 1, 0]
 */
export function oneHot(categories: Categories, { name, weight = 1, rows }: OneHotOptions): NumericTable {
  if (!(weight >= 0) || !Number.isFinite(weight)) throw new Error(`invalid one-hot weight: ${weight}`);
  const { codes, levels } = categories;
  const width = levels.length;
  const count = rows ? rows.length : codes.length;
  const values = new Float64Array(count * width);
  for (let i = 0; i < count; ++i) {
    const row = rows ? rows[i]! : i;
    if (!(row >= 0 && row < codes.length)) throw new Error(`row out of range: ${row}`);
    const code = codes[row]!;
    if (code === missingCode) values.fill(NaN, i * width, (i + 1) * width);
    else values[i * width + code] = weight;
  }
  return { rows: count, columns: width, names: levels.map((level) => `${name}=${level}`), values };
}
