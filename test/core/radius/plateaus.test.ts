import { describe, expect, it } from "vitest";
import { assertClose } from "../../assertClose.ts";
import { ascendingRadii, logSpacedRadii } from "../../../src/core/sweep/logSpacedRadii.ts";
import { plateaus } from "../../../src/core/radius/plateaus.ts";
import { plateauMiddle } from "../../../src/core/radius/plateauMiddle.ts";

describe("plateaus of unchanged b0 and b1", () => {
  it("radii 1, 2, 4, 8 with b0 1, 1, 1, 2 give runs 0..2 (width 2.5 ln 2) and 3..3 (width 0.5 ln 2)", () => {
    const runs = plateaus([1, 2, 4, 8], [1, 1, 1, 2], [0, 0, 0, 0]);
    expect(runs.map((p) => [p.first, p.last, p.b0, p.b1, p.radiusLow, p.radiusHigh])).toEqual([[0, 2, 1, 0, 1, 4], [3, 3, 2, 0, 8, 8]]); // worked by hand
    assertClose(runs.map((p) => p.logWidth), [2.5 * Math.LN2, 0.5 * Math.LN2]); // worked by hand: ln(√32 / 1), ln(8 / √32)
  });

  it("a change of b1 alone ends a plateau, and a radius left out splits a run", () => {
    expect(plateaus([1, 2, 3], [1, 1, 1], [0, 1, 1]).map((p) => [p.first, p.last])).toEqual([[0, 0], [1, 2]]); // worked by hand
    expect(plateaus([1, 2, 3, 4], [1, 1, 1, 1], [0, 0, 0, 0], (k) => k !== 1).map((p) => [p.first, p.last])).toEqual([[0, 0], [2, 3]]); // worked by hand
  });

  it("the plateaus' widths add up to ln(r_last / r_first)", () => {
    const radii = [0.3, 0.5, 0.55, 1, 2.5, 7];
    const total = plateaus(radii, [3, 2, 2, 1, 1, 1], [0, 0, 1, 1, 1, 0]).reduce((sum, p) => sum + p.logWidth, 0);
    assertClose(total, Math.log(7 / 0.3)); // the halfway points telescope (worked by hand)
  });
});

describe("suggested starting radius", () => {
  const figures = { nodes: [40, 20, 9, 4], largestNodeShare: [0.1, 0.2, 0.3, 0.6], b0: [1, 1, 1, 1], b1: [1, 1, 1, 0] };

  it("is 2 for radii 1, 2, 4, 8 when the last radius has 4 nodes: the widest eligible run is 0..2 and 2 is nearest its middle", () => {
    // run 0..2 spans ln 1 .. ln √32, middle 1.25 ln 2; ln 2 is 0.25 ln 2 away, ln 4 0.75 ln 2 (worked by hand)
    expect(plateauMiddle([1, 2, 4, 8], figures)).toMatchObject({ radius: 2, index: 1, plateau: { first: 0, last: 2 } });
  });

  it("leaves out radii with fewer than 5 nodes or a node holding more than half the rows, and is null when none is left", () => {
    expect(plateauMiddle([1, 2], { nodes: [4, 3], largestNodeShare: [0.2, 0.2], b0: [1, 1], b1: [0, 0] })).toBeNull(); // fewer than 5 nodes
    expect(plateauMiddle([1, 2], { nodes: [9, 6], largestNodeShare: [0.51, 0.6], b0: [1, 1], b1: [0, 0] })).toBeNull(); // a node holds more than half
  });

  it("of two equally wide runs takes the one at smaller radii", () => {
    const s = plateauMiddle([1, 2, 4, 8], { nodes: [50, 40, 30, 20], largestNodeShare: [0.1, 0.1, 0.1, 0.1], b0: [2, 2, 1, 1], b1: [0, 0, 0, 0] });
    expect(s?.plateau.first).toBe(0); // both runs are 1.5 ln 2 wide (worked by hand); ties to the lower one
  });
});

describe("radius lists", () => {
  it("1 to 100 in 3 log-spaced steps is 1, 10, 100 with both ends exact", () => {
    const radii = logSpacedRadii(1, 100, 3);
    expect([radii[0], radii[2]]).toEqual([1, 100]);
    assertClose(radii[1], 10); // 1 · 100^(1/2)
  });

  it("rejects a bad range or step count, naming the bad value", () => {
    expect(() => logSpacedRadii(0, 1, 3)).toThrow("invalid radius: 0");
    expect(() => logSpacedRadii(2, 1, 3)).toThrow("invalid radius range: 2 to 1");
    expect(() => logSpacedRadii(1, 2, 1)).toThrow("invalid steps: 1");
    expect(() => ascendingRadii([1, NaN])).toThrow("invalid radius: NaN");
    expect(() => ascendingRadii([])).toThrow("a sweep needs at least one radius");
  });

  it("an explicit list is sorted and each radius kept once", () => {
    expect(Array.from(ascendingRadii([3, 1, 2, 1]))).toEqual([1, 2, 3]);
  });
});
