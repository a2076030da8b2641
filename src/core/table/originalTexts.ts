import { CellKind } from "./cellKind.ts";
import { emptyCode, keepsText, type ColumnBuilder } from "./columnBuilder.ts";
import type { OriginalTexts } from "./types.ts";

/**
 * The cells of a numeric column whose text is not the shortest form of their number
 * (`007`, `+5`, `12345678901234567890123`), by ascending row, from whichever form the builder
 * kept its texts in (see ColumnBuilder); null when every number is written in shortest form.
 * O(rows) when the builder is in dictionary or list form, O(kept cells) in sparse form.
 */
export function originalTexts(builder: ColumnBuilder): OriginalTexts | null {
  const rows: number[] = [];
  const texts: string[] = [];
  const add = (row: number, text: string): void => {
    rows.push(row);
    texts.push(text);
  };
  if (builder.rawCodes) {
    const keep = builder.rawLevels.map((text, k) => builder.levelKinds[k] === CellKind.number && keepsText(CellKind.number, builder.levelValues[k]!, text));
    if (!keep.includes(true)) return null;
    const codes = builder.rawCodes.toArray();
    for (let r = 0; r < codes.length; ++r) {
      const code = codes[r]!;
      if (code !== emptyCode && keep[code]) add(r, builder.rawLevels[code]!);
    }
  } else if (builder.list) {
    builder.list.forEach((text, r) => {
      const value = builder.numbers.get(r);
      if (value === value && keepsText(CellKind.number, value, text)) add(r, text);
    });
  } else if (builder.sparseRows) {
    const sparse = builder.sparseRows.toArray();
    for (let k = 0; k < sparse.length; ++k) {
      const value = builder.numbers.get(sparse[k]!);
      if (value === value) add(sparse[k]!, builder.sparseTexts![k]!);
    }
  }
  return rows.length === 0 ? null : { rows: Uint32Array.from(rows), texts };
}
