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
