import { describe, expect, it } from "vitest";
import { parseCsvText, selectFeatures } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

const parsed = Object.freeze(parseCsvText("id,x,y,label\na,1,10,p\nb,,20,q\nc,3,NA,r\nd,4,40,s\n"));

describe("selectFeatures", () => {
  it("copies the chosen columns row-major, in the order given, leaving out rows with a missing feature", () => {
    const selection = selectFeatures(parsed, ["y", "x"]);
    // Rows 1 (x missing) and 2 (y missing) are left out; rows 0 and 3 remain.
    expect(selection.table).toMatchObject({ rows: 2, columns: 2, names: ["y", "x"] });
    assertClose(selection.table.values, [10, 1, 40, 4]);
    expect(Array.from(selection.usedRows)).toEqual([0, 3]);
    expect(Array.from(selection.droppedRows)).toEqual([1, 2]);
  });

  it("only the chosen features decide which rows are dropped", () => {
    const selection = selectFeatures(parsed, ["y"]);
    expect(Array.from(selection.usedRows)).toEqual([0, 1, 3]);
    expect(Array.from(selection.droppedRows)).toEqual([2]);
  });

  it("throws for no features, an unknown column and a text column", () => {
    expect(() => selectFeatures(parsed, [])).toThrow("choose at least one feature column");
    expect(() => selectFeatures(parsed, ["x", "nope"])).toThrow("unknown column: nope");
    expect(() => selectFeatures(parsed, ["label"])).toThrow("not a numeric column: label");
  });
});

describe("selectFeatures: missing-value report", () => {
  it("under drop: read 4 = used 2 + dropped 2, rows 2 and 3 (1-based) dropped, one per column", () => {
    expect(selectFeatures(parsed, ["x", "y"]).missing).toEqual({
      policy: "drop",
      read: 4,
      used: 2,
      dropped: 2,
      firstDropped: [2, 3], // parsed rows 1 and 2, counted from 1
      columns: [
        { name: "x", missing: 1, dropped: 1, imputed: 0, fill: NaN },
        { name: "y", missing: 1, dropped: 1, imputed: 0, fill: NaN },
      ],
    });
  });

  it("under median: nothing dropped, one value filled per column with the type-7 median (x of 1,3,4 → 3; y of 10,20,40 → 20)", () => {
    const { missing, table } = selectFeatures(parsed, ["x", "y"], "median");
    expect(missing).toMatchObject({ read: 4, used: 4, dropped: 0, firstDropped: [] });
    expect(missing.columns).toEqual([
      { name: "x", missing: 1, dropped: 0, imputed: 1, fill: 3 }, // worked by hand
      { name: "y", missing: 1, dropped: 0, imputed: 1, fill: 20 }, // worked by hand
    ]);
    assertClose(table.values, [1, 10, 3, 20, 3, 20, 4, 40]);
  });

  it("lists at most ten dropped rows", () => {
    const text = `x\n${Array.from({ length: 15 }, () => "NA").join("\n")}\n1\n2\n`;
    const { missing } = selectFeatures(parseCsvText(text), ["x"]);
    expect(missing).toMatchObject({ read: 17, used: 2, dropped: 15, firstDropped: [1, 2, 3, 4, 5, 6, 7, 8, 9, 10] });
  });

  it("an all-missing (empty) column cannot be a feature", () => {
    expect(() => selectFeatures(parseCsvText("x,y\nNA,1\n,2\n"), ["x"])).toThrow("column has no values: x");
  });
});
