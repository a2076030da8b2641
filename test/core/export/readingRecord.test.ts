import { describe, expect, it } from "vitest";
import { readingRecord } from "../../../src/core/index.ts";

describe("readingRecord", () => {
  it("names a pipe-delimited read 'pipe' with ragged rows 'reject' by default, and Parquet by its format alone", () => {
    // names as `--delimiter pipe` and `--ragged reject` take them (README, the headless command)
    expect(readingRecord({ kind: "delimited", delimiter: "|", decimal: ".", delimiterDetected: true, decimalDetected: true })).toEqual({ format: "delimited", delimiter: "pipe", decimal: ".", ragged: "reject" });
    expect(readingRecord({ kind: "delimited", delimiter: ";", decimal: ",", delimiterDetected: false, decimalDetected: true }, "pad")).toEqual({ format: "delimited", delimiter: "semicolon", decimal: ",", ragged: "pad" });
    expect(readingRecord({ kind: "parquet" })).toEqual({ format: "parquet" });
  });
});
