import { describe, expect, it } from "vitest";
import { readTableText } from "../../../src/core/table/readTableText.ts";
import { assertClose } from "../../assertClose.ts";
import { outcomeOf, readInChunksOf } from "./readerSupport.ts";

describe("empty lines: a record in a one-column file, not a record in a wider one", () => {
  it("one column: x\\n1\\n\\n3\\n has 3 records, 1, missing, 3", () => {
    const { table, report } = readTableText("x\n1\n\n3\n");
    expect(table.rows).toBe(3); // worked by hand: lines 2, 3 and 4 are records 1, 2 and 3
    assertClose(table.columns[0]!.numbers, [1, NaN, 3]);
    expect(table.columns[0]!.missing).toBe(1); // the empty cell of record 2
    expect(report.emptyLines).toBe(0); // the empty line was read as a record
  });

  it("one column: an empty last line before the final line break is a record (x\\n1\\n\\n has 2 records)", () => {
    const { table } = readTableText("x\n1\n\n");
    expect(table.rows).toBe(2); // worked by hand: lines 2 and 3; the final line break ends line 3
    assertClose(table.columns[0]!.numbers, [1, NaN]);
  });

  it("one column: the final line break alone adds no record (x\\n1\\n2\\n has 2 records, as x\\n1\\n2)", () => {
    expect(readTableText("x\n1\n2\n").table.rows).toBe(2); // worked by hand
    expect(readTableText("x\n1\n2").table.rows).toBe(2); // worked by hand
  });

  it("one column: record numbers after an empty line do not shift, in any chunking (row 4 is 4)", () => {
    const text = "x\n1\n\n3\n4\n";
    for (const size of [1, 2, 3, 5, 100]) {
      const { table } = outcomeOf(readInChunksOf(text, size));
      assertClose(table.columns[0]!.numbers, [1, NaN, 3, 4]); // worked by hand
    }
  });

  it("two columns: a wholly empty line is not a record (2 records) and the report counts 1 empty line", () => {
    const { table, report } = readTableText("a,b\n1,2\n\n3,4\n");
    expect(table.rows).toBe(2); // worked by hand
    assertClose(table.columns[0]!.numbers, [1, 3]);
    expect(report.emptyLines).toBe(1); // worked by hand: line 3
    expect(report.lines).toBe(4); // worked by hand
    expect(report.notices.find((n) => n.code === "empty-lines")?.message).toBe("skipped 1 wholly empty line: not records, so record k is on spreadsheet row k + 1 plus the empty lines above it");
  });

  it("empty lines before the header are counted and skipped (2 lines, in one column too)", () => {
    const { table, report } = readTableText("\n\nx\n5\n");
    expect(table.columns[0]!.name).toBe("x");
    expect(table.rows).toBe(1); // worked by hand
    expect(report.emptyLines).toBe(2); // worked by hand
  });
});
