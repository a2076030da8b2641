import { describe, expect, it } from "vitest";
import { regionRowsCsv } from "../../../src/core/export/regionRowsCsv.ts";

const texts = new Map<number, readonly string[]>([
  [0, ["007", "12345678901234567890", "-5", "=1+1"]],
  [1, ["+3.2", "-x", "1,5", "plain"]],
  [4, ["08", "", "@a", "two\nlines"]],
]);

describe("regionRowsCsv", () => {
  it("keeps 007, a 20-digit number and -5 exactly as read, and neutralises =1+1", () => {
    const csv = regionRowsCsv([{ name: "hot", rows: [0] }], ["code", "big", "delta", "formula"], texts, ".");
    expect(csv).toBe("region,row,code,big,delta,formula\nhot,1,007,12345678901234567890,-5,'=1+1\n"); // the product owner's rule: numbers as read, text guarded
  });

  it("guards text cells only: +3.2 stays, -x and @a get a quote mark; a comma or line break is quoted", () => {
    const csv = regionRowsCsv([{ name: "r", rows: [1, 4] }], ["a", "b", "c", "d"], texts, ".");
    expect(csv.split("\n").slice(1).join("\n")).toBe("r,2,+3.2,'-x,\"1,5\",plain\nr,5,08,,'@a,\"two\nlines\"\n");
  });

  it("under a decimal comma, 1,5 is a number (quoted, not prefixed) and +3.2 is text (prefixed), as the file's reader sees them", () => {
    expect(regionRowsCsv([{ name: "r", rows: [1] }], ["a", "b", "c", "d"], texts, ",")).toContain('r,2,\'+3.2,\'-x,"1,5",plain\n');
  });

  it("writes a row once per region it is in, regions in the order given", () => {
    const csv = regionRowsCsv([{ name: "a", rows: [0, 1] }, { name: "b", rows: [1] }], ["w", "x", "y", "z"], texts, ".");
    expect(csv.split("\n").slice(1, -1).map((line) => line.split(",").slice(0, 2).join(","))).toEqual(["a,1", "a,2", "b,2"]);
  });

  it("an input column named region or row gets a trailing underscore (two if row_ is an input column too, which keeps its name)", () => {
    const csv = regionRowsCsv([{ name: "a", rows: [0] }], ["region", "row", "row_", "x"], texts, ".");
    expect(csv.split("\n")[0]).toBe("region,row,region_,row__,row_,x");
  });

  it("a region name that looks like a formula is neutralised; a row with no texts throws naming it", () => {
    expect(regionRowsCsv([{ name: "=bad", rows: [0] }], ["a", "b", "c", "d"], texts, ".").split("\n")[1]!.startsWith("'=bad,1,")).toBe(true);
    expect(() => regionRowsCsv([{ name: "a", rows: [2] }], ["a"], texts, ".")).toThrow("no cell texts for row 3 of region a");
  });

  it("the JSDoc example: one row of -5 in region a", () => {
    expect(regionRowsCsv([{ name: "a", rows: [1] }], ["x"], new Map([[1, ["-5"]]]), ".")).toBe("region,row,x\na,2,-5\n");
  });
});
