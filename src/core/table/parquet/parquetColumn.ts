import type { SchemaElement } from "hyparquet";
import { ColumnBuilder } from "../columnBuilder.ts";

const timeTypes = new Set(["DATE", "TIME", "TIMESTAMP", "TIME_MILLIS", "TIME_MICROS", "TIMESTAMP_MILLIS", "TIMESTAMP_MICROS"]);

/** A column builder fed with decoded Parquet values. */
export interface ParquetColumn {
  readonly builder: ColumnBuilder;
  /** Whether the column's physical type is a number (then no cell text is kept). */
  readonly numeric: boolean;
  /** Integers beyond ±2^53 read (rounded to the nearest double). */
  largeIntegers: number;
}

/**
 * Chooses how to read a flat Parquet column: INT32, INT64, FLOAT and DOUBLE without a date or
 * time annotation are numbers (kept as Float64, no text); everything else (strings, booleans,
 * dates, timestamps) is read as cell text, so the same inference as for a CSV decides its type.
 */
export function parquetColumn(element: SchemaElement): ParquetColumn {
  const type = element.type ?? "";
  const time = timeTypes.has(element.logical_type?.type ?? "") || timeTypes.has(element.converted_type ?? "");
  const numeric = !time && (type === "INT32" || type === "INT64" || type === "FLOAT" || type === "DOUBLE");
  return { builder: new ColumnBuilder(".", numeric), numeric, largeIntegers: 0 };
}

/** Adds one decoded value: null is an empty cell; dates become ISO 8601 text. */
export function pushParquetValue(column: ParquetColumn, value: unknown): void {
  const { builder } = column;
  if (value === null || value === undefined) return builder.pushEmpty();
  if (column.numeric) {
    if (typeof value === "bigint") {
      if (value > 9007199254740991n || value < -9007199254740991n) column.largeIntegers++; // Number.MAX_SAFE_INTEGER
      return builder.pushNumber(Number(value));
    }
    return builder.pushNumber(typeof value === "number" ? value : Number(value));
  }
  builder.push(cellText(value), 0);
}

function cellText(value: unknown): string {
  if (typeof value === "string") return value;
  if (value instanceof Date) return Number.isNaN(value.getTime()) ? "" : value.toISOString();
  if (typeof value === "object") return JSON.stringify(value, (_, v: unknown) => (typeof v === "bigint" ? v.toString() : v));
  return String(value);
}
