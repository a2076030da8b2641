import { expect, it } from "vitest";
import { symmetricDifference } from "../../../src/core/nerve/symmetricDifference.ts";

it("symmetric difference of [1, 2, 5] and [2, 3] is [1, 3, 5] (worked by hand: 2 cancels over GF(2))", () => {
  expect(symmetricDifference([1, 2, 5], [2, 3])).toEqual([1, 3, 5]);
  expect(symmetricDifference([4], [4])).toEqual([]); // a column plus itself is zero over GF(2)
});
