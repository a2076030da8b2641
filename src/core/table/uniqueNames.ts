import type { Notice } from "./tableReport.ts";

/**
 * Column names from a header: trimmed; an empty cell becomes column_j (1-based j) and a repeat
 * gets a suffix _2, _3, … so that no two columns are ever merged (common practice, no source).
 * Each change comes with one notice naming the column's position and both names.
 * @example uniqueNames(["a", "a", ""]).names // => ["a", "a_2", "column_3"]
 */
export function uniqueNames(header: readonly string[]): { names: string[]; notices: Notice[] } {
  const seen = new Set<string>();
  const notices: Notice[] = [];
  const names = header.map((raw, j) => {
    const trimmed = raw.trim();
    const base = trimmed === "" ? `column_${j + 1}` : trimmed;
    let name = base;
    for (let k = 2; seen.has(name); ++k) name = `${base}_${k}`;
    seen.add(name);
    if (trimmed === "") notices.push({ code: "renamed-column", message: `column ${j + 1} has no name: called it ${name}` });
    else if (name !== base) notices.push({ code: "renamed-column", message: `column ${j + 1} repeats the name ${JSON.stringify(base)}: renamed it ${name}` });
    return name;
  });
  return { names, notices };
}
