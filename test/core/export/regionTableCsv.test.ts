import { describe, expect, it } from "vitest";
import { regionTableCsv } from "../../../src/core/export/regionTableCsv.ts";
import { regionSides } from "../../../src/core/regions/regionSides.ts";
import { regionTable } from "../../../src/core/regions/regionTable.ts";
import { parseCsvText } from "../../../src/core/table/parseCsvText.ts";
import { assertClose } from "../../assertClose.ts";

describe("regionTableCsv", () => {
  const table = parseCsvText("x,y,g\n1,10,a\n2,10,a\n3,10,b\n2,10,b\n4,10,b\n");
  const result = regionTable(table, regionSides(5, Uint32Array.of(0, 1, 2, 3, 4), [0, 1, 2]), { labelColumn: null });
  const csv = regionTableCsv(result);
  const lines = csv.split("\n");

  it("has the header column, kind, test, n_inside, n_outside, mean_inside, mean_outside, median_inside, median_outside, d, statistic, p, p_adj", () => {
    expect(lines[0]).toBe("column,kind,test,n_inside,n_outside,mean_inside,mean_outside,median_inside,median_outside,d,statistic,p,p_adj");
  });

  it("writes one line per column in the table's order, numbers in shortest round-trip form, NaN and figures that do not apply as empty cells", () => {
    expect(lines.length).toBe(5); // header, x, y, g and the empty string after the last line end
    const [x, y, g] = lines.slice(1, 4).map((line) => line.split(","));
    expect(x!.slice(0, 9)).toEqual(["x", "numeric", "ks", "3", "2", "2", "3", "2", "3"]); // worked by hand (see compareNumeric.test.ts)
    expect(Number(x![9])).toBe(result.lines[0]!.kind === "numeric" ? result.lines[0]!.d : NaN); // reads back as the same double
    assertClose(Number(x![9]), -Math.sqrt(3) / 2); // worked by hand
    expect(y!.slice(9, 12)).toEqual(["", "0", "1"]); // worked by hand: no spread, so no d; D = 0, p = 1
    expect(g!.slice(0, 10)).toEqual(["g", "categorical", "chi2", "3", "2", "", "", "", "", ""]);
    assertClose(Number(g![10]), 20 / 9); // worked by hand (see compareCategorical.test.ts)
  });
});
