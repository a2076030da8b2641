// Each metric against a general-purpose library, ml-distance 5, on random vectors. ml-distance
// gives the three Minkowski-type distances directly and cosine and Pearson as similarities s,
// so the distances compared are 1 − s. (ml-distance's own `distance.pearson` is a different,
// chi-square-like quantity, Σ (a − b)² / b, and is not used.)
import { describe, it } from "vitest";
import fc from "fast-check";
import { distance as mlDistance, similarity as mlSimilarity } from "ml-distance";
import { chebyshev, correlation, cosine, euclidean, manhattan } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";
import { definedPoints, points, rowsOf } from "../support/metricVectors.ts";

// Relative 1e-12 (a few ulps of accumulated error over ≤ 8 terms, common practice, no source); an
// absolute 1e-12 as well for cosine and correlation distances near 0, where 1 − s cancels.
const tolerance = { relative: 1e-12, absolute: 1e-12 };

describe("the five metrics agree with ml-distance on random vectors", () => {
  it("euclidean distance equals ml-distance distance.euclidean", () => {
    fc.assert(
      fc.property(points(2), ([a, b]) => {
        assertClose(euclidean.distance(rowsOf(a!, b!), a!.length, 0, 1), mlDistance.euclidean(a!, b!), tolerance); // ml-distance distance.euclidean
      }),
    );
  });

  it("manhattan distance equals ml-distance distance.manhattan", () => {
    fc.assert(
      fc.property(points(2), ([a, b]) => {
        assertClose(manhattan.distance(rowsOf(a!, b!), a!.length, 0, 1), mlDistance.manhattan(a!, b!), tolerance); // ml-distance distance.manhattan
      }),
    );
  });

  it("chebyshev distance equals ml-distance distance.chebyshev", () => {
    fc.assert(
      fc.property(points(2), ([a, b]) => {
        assertClose(chebyshev.distance(rowsOf(a!, b!), a!.length, 0, 1), mlDistance.chebyshev(a!, b!), tolerance); // ml-distance distance.chebyshev
      }),
    );
  });

  it("cosine distance equals 1 − ml-distance similarity.cosine on rows that are not zero", () => {
    fc.assert(
      fc.property(definedPoints(cosine, 2), ([a, b]) => {
        assertClose(cosine.distance(rowsOf(a!, b!), a!.length, 0, 1), 1 - mlSimilarity.cosine(a!, b!), tolerance); // ml-distance similarity.cosine
      }),
    );
  });

  it("correlation distance equals 1 − ml-distance similarity.pearson on rows that are not constant", () => {
    fc.assert(
      fc.property(definedPoints(correlation, 2), ([a, b]) => {
        assertClose(correlation.distance(rowsOf(a!, b!), a!.length, 0, 1), 1 - mlSimilarity.pearson(a!, b!), tolerance); // ml-distance similarity.pearson
      }),
    );
  });
});

describe("the JSDoc examples of the five metrics", () => {
  it("euclidean (0, 0)–(3, 4) is 5, manhattan (0, 0)–(3, −4) is 7, chebyshev (0, 0)–(3, −4) is 4", () => {
    assertClose(euclidean.distance(rowsOf([0, 0], [3, 4]), 2, 0, 1), 5); // worked by hand: √(9 + 16)
    assertClose(manhattan.distance(rowsOf([0, 0], [3, -4]), 2, 0, 1), 7); // worked by hand: 3 + 4
    assertClose(chebyshev.distance(rowsOf([0, 0], [3, -4]), 2, 0, 1), 4); // worked by hand: max(3, 4)
  });

  it("cosine (1, 0)–(0, 1) is 1 and correlation (1, 2, 3)–(6, 4, 2) is 2", () => {
    assertClose(cosine.distance(rowsOf([1, 0], [0, 1]), 2, 0, 1), 1); // worked by hand: orthogonal, similarity 0
    assertClose(correlation.distance(rowsOf([1, 2, 3], [6, 4, 2]), 3, 0, 1), 2); // worked by hand: centred (−1, 0, 1) and (2, 0, −2), r = −1
  });
});
