import { describe, expect, it } from "vitest";
import { isInsidePolygon, pointsInPolygon } from "../../../src/ui/graph/pointInPolygon.ts";

const square = Object.freeze([{ x: 0, y: 0 }, { x: 2, y: 0 }, { x: 2, y: 2 }, { x: 0, y: 2 }]);
// a "C" opening to the right: the notch (1..3) × (1..2) is outside, worked by hand
const concave = Object.freeze([
  { x: 0, y: 0 }, { x: 3, y: 0 }, { x: 3, y: 1 }, { x: 1, y: 1 }, { x: 1, y: 2 }, { x: 3, y: 2 }, { x: 3, y: 3 }, { x: 0, y: 3 },
]);

describe("isInsidePolygon (even–odd crossing test: M. Shimrat, Algorithm 112, Commun. ACM 5(8):434, 1962)", () => {
  it("the centre (1, 1) of the square 0..2 is inside (one crossing to the right, worked by hand)", () => {
    expect(isInsidePolygon({ x: 1, y: 1 }, square)).toBe(true);
  });

  it("(3, 1) and (-1, 1) are outside the square 0..2 (zero and two crossings, worked by hand)", () => {
    expect(isInsidePolygon({ x: 3, y: 1 }, square)).toBe(false);
    expect(isInsidePolygon({ x: -1, y: 1 }, square)).toBe(false);
  });

  it("the same square listed clockwise gives the same answers (orientation does not matter)", () => {
    const clockwise = [...square].reverse();
    expect([isInsidePolygon({ x: 1, y: 1 }, clockwise), isInsidePolygon({ x: 3, y: 1 }, clockwise)]).toEqual([true, false]);
  });

  it("in the C-shaped polygon, (2, 1.5) in the notch is outside and (0.5, 1.5), (2, 0.5), (2, 2.5) are inside (worked by hand)", () => {
    expect(isInsidePolygon({ x: 2, y: 1.5 }, concave)).toBe(false);
    expect([{ x: 0.5, y: 1.5 }, { x: 2, y: 0.5 }, { x: 2, y: 2.5 }].map((p) => isInsidePolygon(p, concave))).toEqual([true, true, true]);
  });

  it("a ray through a vertex of the C counts it once: (0.5, 1) is inside, (-1, 1) outside (half-open rule, worked by hand)", () => {
    expect(isInsidePolygon({ x: 0.5, y: 1 }, concave)).toBe(true);
    expect(isInsidePolygon({ x: -1, y: 1 }, concave)).toBe(false);
  });

  it("a polygon of two vertices encloses nothing", () => {
    expect(isInsidePolygon({ x: 0, y: 0 }, [{ x: -1, y: -1 }, { x: 1, y: 1 }])).toBe(false);
  });

  it("a self-crossing bow tie: (0.2, 1) and (1.8, 1) in its lobes are inside (3 and 1 crossings), (1, 0.2) below the crossing is outside (2), worked by hand", () => {
    const bowTie = [{ x: 0, y: 0 }, { x: 2, y: 2 }, { x: 2, y: 0 }, { x: 0, y: 2 }];
    expect([isInsidePolygon({ x: 0.2, y: 1 }, bowTie), isInsidePolygon({ x: 1.8, y: 1 }, bowTie), isInsidePolygon({ x: 1, y: 0.2 }, bowTie)]).toEqual([true, true, false]);
  });
});

describe("pointsInPolygon", () => {
  it("keeps the indices 2 and 7 of the points inside the C, ascending, and drops the one in the notch", () => {
    const points = [{ index: 7, x: 2, y: 2.5 }, { index: 4, x: 2, y: 1.5 }, { index: 2, x: 0.5, y: 0.5 }];
    expect(pointsInPolygon(points, concave)).toEqual([2, 7]);
  });
});
