import { describe, expect, it } from "vitest";
import { parseCsvText } from "../../../src/core/table/parseCsvText.ts";
import { regionSides } from "../../../src/core/regions/regionSides.ts";
import { regionTable } from "../../../src/core/regions/regionTable.ts";
import { chiSquaredIndependence } from "../../../src/core/stats/chiSquaredIndependence.ts";
import { assertClose } from "../../assertClose.ts";

// Rows 0–2 are the region, rows 3–4 the rest, row 5 was left out of the build (its 100 must not count).
const table = parseCsvText("id,x,y,z,g,name\n1,1,10,1,a,p\n2,2,10,NA,a,q\n3,3,10,3,b,r\n4,2,10,5,b,s\n5,4,10,7,b,t\n6,100,10,9,b,u\n");
const sides = regionSides(6, Uint32Array.of(0, 1, 2, 3, 4), [0, 1, 2]);
const pG = chiSquaredIndependence([[2, 1], [0, 2]]).pValue; // the independently tested stats function (X² = 20/9 by hand)

describe("regionTable on a table worked by hand", () => {
  const result = regionTable(table, sides, { labelColumn: "id" });

  it("tests every column but the row label and the identifier-like one: numeric by D (1, 1/2, 0), then categorical", () => {
    expect(result.lines.map((l) => [l.column, l.kind, l.test])).toEqual([["z", "numeric", "ks"], ["x", "numeric", "ks"], ["y", "numeric", "ks"], ["g", "categorical", "chi2"]]);
    expect(result.skipped).toEqual([{ column: "name", reason: "identifier" }]);
    expect([result.rowsInside, result.rowsOutside, result.rowsUnused]).toEqual([3, 2, 1]);
  });

  it("the figures are those worked by hand (z leaves its missing value out: 2 against 2)", () => {
    const [z, x, y, g] = result.lines;
    if (z?.kind !== "numeric" || x?.kind !== "numeric" || y?.kind !== "numeric" || g?.kind !== "categorical") throw new Error("unexpected line kinds");
    expect([z!.nInside, z!.nOutside, x!.nInside, x!.nOutside, g!.nInside, g!.nOutside]).toEqual([2, 2, 3, 2, 3, 2]);
    assertClose([z!.statistic, z!.p], [1, 1 / 3]); // worked by hand: no overlap; 2 of the 6 orderings of 2 + 2 values
    assertClose([x!.statistic, x!.p, x!.d], [0.5, 0.9, -Math.sqrt(3) / 2]); // worked by hand (see compareNumeric.test.ts)
    assertClose([y!.statistic, y!.p, y!.d], [0, 1, NaN], { absolute: 0 }); // worked by hand: equal samples; no spread, so no d
    assertClose(g!.statistic, 20 / 9); // worked by hand: counts a 2/0, b 1/2
    expect(g!.p).toBe(pG);
  });

  it("p_adj is Benjamini–Hochberg over the four lines: 2/3, 1, 1 and 4·p_g", () => {
    // worked by hand: ascending p_g (≈0.136), 1/3, 0.9, 1; ranks ×4/1, 4/2, 4/3, 4/4 give 4p_g, 2/3, 1.2, 1; running minimum from the top
    assertClose(result.lines.map((l) => l.pAdjusted), [2 / 3, 1, 1, 4 * pG]);
  });

  it("A vs B gives the same table as region against the rest when B is the rest", () => {
    const versus = regionTable(table, regionSides(6, Uint32Array.of(0, 1, 2, 3, 4), [0, 1, 2], [3, 4]), { labelColumn: "id" });
    expect(versus.lines).toEqual(result.lines);
  });

  it("a shouldStop that answers true stops with Cancelled", () => {
    expect(() => regionTable(table, sides, { labelColumn: "id", shouldStop: () => true })).toThrow("the region table was cancelled");
  });

  it("progress counts the columns done, up to all six but the label", () => {
    const seen: number[] = [];
    regionTable(table, sides, { labelColumn: "id", onProgress: (done, total) => seen.push(done / total) });
    expect(seen).toEqual([1 / 5, 2 / 5, 3 / 5, 4 / 5, 1]); // five columns after the label
  });
});

describe("regionTable's JSDoc example", () => {
  it("x = 1, 2, 3 inside against 2, 4 outside has D = 0.5", () => {
    const one = regionTable(parseCsvText("x\n1\n2\n3\n2\n4\n"), regionSides(5, Uint32Array.of(0, 1, 2, 3, 4), [0, 1, 2]), { labelColumn: null });
    assertClose(one.lines[0]!.statistic, 0.5); // worked by hand (see compareNumeric.test.ts)
  });
});
