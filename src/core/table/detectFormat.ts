import Papa from "papaparse";
import { delimiters, type DecimalMark, type Delimiter } from "./readOptions.ts";

/**
 * Delimiter detection over the start of a text (line ends already "\n"). Each candidate
 * , ; tab | splits the sample's complete records with RFC 4180 quoting; the header's field count
 * w is the width it proposes, and its score is the share of the following records with exactly w
 * fields (1 when there are none). Among candidates with w > 1 the highest score wins, ties going
 * to the larger w and then to the order , ; tab |. When every candidate leaves the header whole,
 * the text is one column and the candidate that splits the fewest records wins (same ties).
 * `complete` says the sample is the whole text (its last record is then complete too).
 * O(4 · sample length).
 * @example detectDelimiter("a;b\n1,5;2\n3,5;4\n", true) // => ";"
 */
export function detectDelimiter(sample: string, complete: boolean): Delimiter {
  let best: { delimiter: Delimiter; score: number; width: number } | null = null;
  for (const delimiter of delimiters) {
    const [header, ...records] = sampleRecords(sample, delimiter, complete);
    const width = header?.length ?? 1;
    const score = records.length === 0 ? 1 : records.filter((r) => r.length === width).length / records.length;
    const better = !best || (width > 1) !== (best.width > 1) ? width > 1 : score > best.score || (score === best.score && width > best.width);
    if (!best || better) best = { delimiter, score, width };
  }
  return best?.delimiter ?? ",";
}

const commaNumber = /^\s*[+-]?\d*,\d+(?:[eE][+-]?\d+)?\s*$/;
const pointNumber = /^\s*[+-]?\d*\.\d+(?:[eE][+-]?\d+)?\s*$/;

/**
 * Decimal-mark detection: with a delimiter other than ",", the sample's cells that look like
 * "12,5" are counted against those that look like "12.5", and "," wins only with more cells.
 * With "," between fields the mark is "." (override it for quoted "12,5" cells). O(sample length).
 * @example detectDecimalMark("a;b\n1,5;2\n", ";", true) // => ","
 */
export function detectDecimalMark(sample: string, delimiter: Delimiter, complete: boolean): DecimalMark {
  if (delimiter === ",") return ".";
  let comma = 0;
  let point = 0;
  for (const record of sampleRecords(sample, delimiter, complete)) {
    for (const cell of record) {
      if (commaNumber.test(cell)) comma++;
      else if (pointNumber.test(cell)) point++;
    }
  }
  return comma > point ? "," : ".";
}

function sampleRecords(sample: string, delimiter: Delimiter, complete: boolean): string[][] {
  const parsed = new Papa.Parser({ delimiter, newline: "\n" }).parse(sample, 0, !complete);
  return (parsed.data as string[][]).filter((record) => !(record.length === 1 && record[0] === ""));
}
