import { cellKind, CellKind } from "../table/cellKind.ts";
import type { DecimalMark } from "../table/readOptions.ts";
import { csvLine, csvQuoted, csvText } from "./csvCell.ts";

/** A named region: its rows, 0-based rows of the parsed table. */
export interface Region {
  readonly name: string;
  readonly rows: ArrayLike<number>;
}

/**
 * region-rows.csv: `region` (its name), `row` (the 1-based record number), then every input column
 * with the cell's text as read from the file (`readRecordTexts`), one line per row of each region in
 * the order given, so a row in two regions appears twice. An input column named `region` or `row`
 * is written with a trailing underscore (`region_`; one more while that name is taken), other
 * columns keep their names.
 * The CSV-injection guard of `csvText` applies to text cells only: a cell that reads as a number
 * under the file's decimal mark (`-5`, `+3.2`, `007`) is written as it is, quoted only if it must be.
 * Throws when a region's row has no texts (it was not read again).
 * @example regionRowsCsv([{ name: "a", rows: [1] }], ["x"], new Map([[1, ["-5"]]]), ".") // => "region,row,x\na,2,-5\n"
 */
export function regionRowsCsv(regions: readonly Region[], columns: readonly string[], texts: ReadonlyMap<number, readonly string[]>, decimal: DecimalMark): string {
  const taken = new Set(["region", "row", ...columns]);
  const names = columns.map((name) => {
    if (name !== "region" && name !== "row") return name;
    let out = `${name}_`;
    while (taken.has(out)) out += "_";
    taken.add(out);
    return out;
  });
  const lines = [csvLine(["region", "row", ...names.map(csvText)])];
  for (const region of regions) {
    const name = csvText(region.name);
    for (let k = 0; k < region.rows.length; ++k) {
      const row = region.rows[k]!;
      const cells = texts.get(row);
      if (!cells) throw new Error(`no cell texts for row ${row + 1} of region ${region.name}`);
      lines.push(csvLine([name, String(row + 1), ...cells.map((cell) => (cellKind(cell, decimal).kind === CellKind.number ? csvQuoted(cell) : csvText(cell)))]));
    }
  }
  return lines.join("");
}
