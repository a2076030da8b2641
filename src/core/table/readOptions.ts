/** Field delimiters the reader detects or accepts. */
export const delimiters = [",", ";", "\t", "|"] as const;
export type Delimiter = (typeof delimiters)[number];
/** The one name of each delimiter, used by the headless command, the workbench and summary.json. */
export const delimiterNames = { ",": "comma", ";": "semicolon", "\t": "tab", "|": "pipe" } as const satisfies Record<Delimiter, string>;
export type DelimiterName = (typeof delimiterNames)[Delimiter];
/** How the workbench shows each delimiter: the character, then its name. */
export const delimiterLabels: Readonly<Record<Delimiter, string>> = { ",": ", (comma)", ";": "; (semicolon)", "\t": "tab", "|": "| (pipe)" };

/** Decimal marks: "." (12.5) or "," (12,5, usually with ";" or tab between fields). */
export type DecimalMark = "." | ",";

/**
 * What to do with a record whose field count differs from the header's:
 * "reject" (the default) fails with one error naming the records; "pad" fills a short record
 * with empty cells and cuts a long one, with a notice naming them.
 */
export type RaggedPolicy = "reject" | "pad";

export interface ReadOptions {
  /** Field delimiter; detected from the start of the text when absent. */
  readonly delimiter?: Delimiter;
  /** Decimal mark; detected from the start of the text when absent. */
  readonly decimal?: DecimalMark;
  readonly ragged?: RaggedPolicy;
}

/** Largest input read, in bytes of the file (and so in characters of its text): 1 GiB. */
export const maxInputBytes = 2 ** 30; // a 1 GiB file of numbers is about 1e8 cells, 0.8 GB as Float64 (our budget, no source)
/** Characters examined to detect the delimiter and the decimal mark. */
export const sniffLength = 65_536; // common practice, no source
/** Longest single record: past it the file is taken to have an unclosed quote or no line breaks. */
export const maxRecordLength = 2 ** 24; // 16 Mi characters (our choice, no source)
/** Distinct values are counted exactly up to this many, then reported as "at least". */
export const distinctCap = 10_000; // our choice, no source
/** Share of the present cells that must be numbers for a column to be numeric. */
export const numericShare = 0.95; // our choice, no source
/** Offending cells kept per column for the report, and records named in notices and errors. */
export const shownCells = 5; // our choice, no source

/** Normalises a delimiter given by name (`delimiterNames`, or `\\t`) or character; throws for anything else. */
export function maybeDelimiter(value: string): Delimiter {
  const named: Record<string, Delimiter> = { comma: ",", semicolon: ";", tab: "\t", "\\t": "\t", pipe: "|" };
  const delimiter = named[value.toLowerCase()] ?? value;
  if ((delimiters as readonly string[]).includes(delimiter)) return delimiter as Delimiter;
  throw new Error(`invalid delimiter: ${JSON.stringify(value)}`);
}

/** Normalises a decimal mark ("." | "," or point | comma); throws for anything else. */
export function maybeDecimalMark(value: string): DecimalMark {
  const mark = value === "point" ? "." : value === "comma" ? "," : value;
  if (mark === "." || mark === ",") return mark;
  throw new Error(`invalid decimal mark: ${JSON.stringify(value)}`);
}

/** Normalises a ragged-record policy; throws for anything else. */
export function maybeRaggedPolicy(value: string): RaggedPolicy {
  if (value === "reject" || value === "pad") return value;
  throw new Error(`invalid ragged-record policy: ${JSON.stringify(value)}`);
}
