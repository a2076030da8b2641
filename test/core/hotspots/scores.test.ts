import { describe, expect, it } from "vitest";
import { bernoulliScore, midranks, normalScore, rankScore } from "../../../src/core/index.ts";
import { assertClose } from "../../assertClose.ts";

describe("Bernoulli log-likelihood ratio (Kulldorff 1997)", () => {
  it("n = 4, c = 3 in N = 10, C = 4 scores 1.777408838419503 for high", () => {
    // worked by hand: 3 ln(3/4) + 1 ln(1/4) + 1 ln(1/6) + 5 ln(5/6) − [4 ln(0.4) + 6 ln(0.6)], evaluated with Python's math.log
    assertClose(bernoulliScore(4, 3, 10, 4, "high"), 1.777408838419503);
    assertClose(bernoulliScore(4, 3, 10, 4, "both"), 1.777408838419503); // worked by hand: "both" takes either side
    expect(bernoulliScore(4, 3, 10, 4, "low")).toBe(0); // worked by hand: the inside rate 3/4 is above 1/6
  });

  it("n = 2, c = 0 in N = 6, C = 3 scores 1.9095425048844383 for low (0 ln 0 = 0)", () => {
    // worked by hand: 0 + 2 ln 1 + 3 ln(3/4) + 1 ln(1/4) − 6 ln(1/2), evaluated with Python's math.log
    assertClose(bernoulliScore(2, 0, 6, 3, "low"), 1.9095425048844383);
    expect(bernoulliScore(2, 0, 6, 3, "high")).toBe(0); // worked by hand: the inside rate 0 is below 3/4
  });

  it("is 0 with no cases, only cases, an empty region or the whole table", () => {
    expect(bernoulliScore(3, 0, 10, 0, "both")).toBe(0); // worked by hand: no cases, equal rates
    expect(bernoulliScore(3, 3, 10, 10, "both")).toBe(0); // worked by hand: only cases, equal rates
    expect(bernoulliScore(0, 0, 10, 4, "both")).toBe(0); // worked by hand: an empty region has no likelihood ratio
    expect(bernoulliScore(10, 4, 10, 4, "both")).toBe(0); // worked by hand: nothing outside
  });

  it("is 0 when the rates inside and outside are equal", () => {
    expect(bernoulliScore(5, 2, 10, 4, "both")).toBe(0); // worked by hand: 2/5 = 2/5
  });
});

describe("normal-model log-likelihood ratio (Kulldorff, Huang and Konty 2009)", () => {
  it("values 2, 3 inside and 0, 1 outside score 2 ln 5 = 3.2188758248682006", () => {
    // worked by hand: N = 4, S = 6, Q = 14; σ0² = (14 − 9)/4 = 1.25; σ² = (14 − 12.5 − 0.5)/4 = 0.25; (N/2) ln(σ0²/σ²) = 2 ln 5
    assertClose(normalScore(2, 5, 4, 6, 14, "high"), 3.2188758248682006);
    expect(normalScore(2, 5, 4, 6, 14, "low")).toBe(0); // worked by hand: the inside mean 2.5 is above 0.5
    assertClose(normalScore(2, 1, 4, 6, 14, "low"), 3.2188758248682006); // worked by hand: the mirror region {0, 1}
  });

  it("is 0 for a constant outcome and Infinity when both sides are constant but differ", () => {
    expect(normalScore(2, 4, 4, 8, 16, "both")).toBe(0); // worked by hand: all values 2, σ0² = 0
    expect(normalScore(2, 2, 4, 2, 2, "high")).toBe(Infinity); // worked by hand: values 1, 1 | 0, 0: σ² = 0 < σ0² = 0.25
  });
});

describe("Wilcoxon rank-sum scan score (Jung and Cho 2015)", () => {
  it("ranks 3, 4 inside among 4 untied values give Z = 2 / sqrt(5/3) = 1.5491933384829668", () => {
    // worked by hand: E = 2·5/2 = 5, Var = 2·2/12 · 5 = 5/3, Z = (7 − 5)/sqrt(5/3), evaluated with Python
    assertClose(rankScore(2, 7, 4, 0, "high"), 1.5491933384829668);
    assertClose(rankScore(2, 3, 4, 0, "low"), 1.5491933384829668); // worked by hand: ranks 1, 2, the mirror
    assertClose(rankScore(2, 3, 4, 0, "both"), 1.5491933384829668); // worked by hand: |Z|
    expect(rankScore(2, 3, 4, 0, "high")).toBe(0); // worked by hand: Z < 0
  });

  it("with a tie (values 1, 1, 2, 3) the tie-corrected Z of {2, 3} is 2 / sqrt(1.5) = 1.6329931618554523", () => {
    const { ranks, ties } = midranks([1, 1, 2, 3]);
    assertClose(ranks, [1.5, 1.5, 3, 4]); // worked by hand: the two 1s share ranks 1 and 2
    expect(ties).toBe(6); // worked by hand: one group of 2: 2³ − 2
    // worked by hand: Var = 2·2/12 · (5 − 6/12) = 1.5, Z = (7 − 5)/sqrt(1.5), evaluated with Python
    assertClose(rankScore(2, 7, 4, ties, "high"), 1.6329931618554523);
  });

  it("midranks of 5, 1, 5, 3 are 3.5, 1, 3.5, 2 with tie term 6 (the JSDoc example)", () => {
    const { ranks, ties } = midranks([5, 1, 5, 3]);
    assertClose(ranks, [3.5, 1, 3.5, 2]); // worked by hand
    expect(ties).toBe(6); // worked by hand
  });

  it("is 0 when every value is tied", () => {
    const { ties } = midranks([2, 2, 2, 2]);
    expect(rankScore(2, 5, 4, ties, "both")).toBe(0); // worked by hand: T = 60 = N(N−1)(N+1), so the variance is 0
  });
});
