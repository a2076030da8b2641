import { expect, it } from "vitest";
import { assertClose } from "../../assertClose.ts";
import { spiralPlacement } from "../../../src/ui/graph/spiralPlacement.ts";

const golden = Math.PI * (3 - Math.sqrt(5)); // d3-force's initial angle

it("layout 1 puts node 0 at (10·√0.5, 0) = (7.0710678118654755, 0) (the JSDoc example; worked by hand)", () => {
  assertClose(spiralPlacement(1, 1), [7.0710678118654755, 0]);
});

it("layout 1 puts node i on spot i: radius 10·√(i + 0.5), angle i·π(3 − √5), as d3-force 3.0 places nodes without a position", () => {
  const xy = spiralPlacement(4, 1);
  for (let i = 0; i < 4; ++i) assertClose([xy[2 * i]!, xy[2 * i + 1]!], [10 * Math.sqrt(0.5 + i) * Math.cos(i * golden), 10 * Math.sqrt(0.5 + i) * Math.sin(i * golden)]);
});

it("another seed uses the same spots, dealt in another order, and the same seed deals them alike", () => {
  const spots = (xy: Float64Array): string[] => Array.from({ length: xy.length / 2 }, (_, i) => `${xy[2 * i]},${xy[2 * i + 1]}`);
  const first = spiralPlacement(50, 1);
  const second = spiralPlacement(50, 2);
  expect(spots(second).sort()).toEqual(spots(first).sort());
  expect(spots(second)).not.toEqual(spots(first));
  expect(spiralPlacement(50, 2)).toEqual(second);
  expect(spiralPlacement(50, 3)).not.toEqual(second);
});

it("no nodes give an empty array, and a layout seed of 0, 1.5 or −2 is refused", () => {
  expect(spiralPlacement(0, 2).length).toBe(0);
  for (const seed of [0, 1.5, -2]) expect(() => spiralPlacement(3, seed)).toThrow(`invalid layout seed: ${seed}`);
});
