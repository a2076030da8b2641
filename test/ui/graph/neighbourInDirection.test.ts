import { describe, expect, it } from "vitest";
import { arrowAngles, neighbourInDirection } from "../../../src/ui/graph/neighbourInDirection.ts";

// positions are screen-like: y grows downwards, so ArrowUp points to −y
const right = arrowAngles.ArrowRight!;
const down = arrowAngles.ArrowDown!;
const left = arrowAngles.ArrowLeft!;
const up = arrowAngles.ArrowUp!;

describe("neighbourInDirection (the neighbour closest in angle to the arrow, strictly within 90°)", () => {
  const positions = Object.freeze([{ x: 0, y: 0 }, { x: 10, y: -1 }, { x: 0, y: -10 }]);

  it("ArrowRight from node 0 picks node 1 at (10, −1), 5.7° off, over node 2 straight up, 90° off (the JSDoc example; worked by hand)", () => {
    expect(neighbourInDirection(0, [1, 2], positions, right)).toBe(1);
  });

  it("ArrowUp from node 0 picks node 2 at (0, −10): screen y grows downwards, so up is −y (0° against 84.3°; worked by hand)", () => {
    expect(neighbourInDirection(0, [1, 2], positions, up)).toBe(2);
  });

  it("ArrowDown and ArrowLeft from node 0 find nothing: both neighbours lie 90° or more away (worked by hand)", () => {
    expect(neighbourInDirection(0, [1, 2], positions, down)).toBeNull();
    expect(neighbourInDirection(0, [1, 2], positions, left)).toBeNull();
  });

  it("a neighbour exactly 90° from the arrow is excluded: (0, 10) is not to the right of (0, 0)", () => {
    expect(neighbourInDirection(0, [1], [{ x: 0, y: 0 }, { x: 0, y: 10 }], right)).toBeNull();
  });

  it("a neighbour just inside 90° counts: (1, 1000) is 89.94° from ArrowRight (atan(1000); worked by hand)", () => {
    expect(neighbourInDirection(0, [1], [{ x: 0, y: 0 }, { x: 1, y: 1000 }], right)).toBe(1);
  });

  it("the smaller angle wins whatever the distance: (100, 10) at 5.7° beats (1, 1) at 45° (worked by hand)", () => {
    expect(neighbourInDirection(0, [1, 2], [{ x: 0, y: 0 }, { x: 1, y: 1 }, { x: 100, y: 10 }], right)).toBe(2);
  });

  it("equal angles go to the lower node number: nodes 5 at (10, 5) and 3 at (10, −5) are both 26.6° from ArrowRight, node 3 wins", () => {
    const mirrored = [{ x: 0, y: 0 }, undefined, undefined, { x: 10, y: -5 }, undefined, { x: 10, y: 5 }];
    expect(neighbourInDirection(0, [5, 3], mirrored, right)).toBe(3);
    expect(neighbourInDirection(0, [3, 5], mirrored, right)).toBe(3);
  });

  it("equal angles at different distances also go to the lower node number: 4 at (20, 0) and 2 at (5, 0), ArrowRight gives 2", () => {
    const positions = [{ x: 0, y: 0 }, undefined, { x: 5, y: 0 }, undefined, { x: 20, y: 0 }];
    expect(neighbourInDirection(0, [4, 2], positions, right)).toBe(2);
  });

  it("ArrowLeft from (0, 0) picks (−10, 3) over (−10, −4): cosines 10/√109 > 10/√116 (worked by hand)", () => {
    expect(neighbourInDirection(0, [1, 2], [{ x: 0, y: 0 }, { x: -10, y: -4 }, { x: -10, y: 3 }], left)).toBe(2);
  });

  it("a neighbour on the same point, one without a position, and the node itself have no direction and are skipped", () => {
    const positions = [{ x: 0, y: 0 }, { x: 0, y: 0 }, undefined, { x: 4, y: 1 }];
    expect(neighbourInDirection(0, [0, 1, 2, 3], positions, right)).toBe(3);
    expect(neighbourInDirection(0, [0, 1, 2], positions, right)).toBeNull();
  });

  it("no neighbours, or a node without a position, gives null", () => {
    expect(neighbourInDirection(0, [], positions, right)).toBeNull();
    expect(neighbourInDirection(7, [1], positions, right)).toBeNull();
  });

  it("works for any angle, not only the four arrows: 45° (down-right on screen) picks (3, 3) over (5, 0)", () => {
    expect(neighbourInDirection(0, [1, 2], [{ x: 0, y: 0 }, { x: 5, y: 0 }, { x: 3, y: 3 }], Math.PI / 4)).toBe(2);
  });
});
