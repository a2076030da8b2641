import { describe, expect, it } from "vitest";
import { landmarkRules, maybeLandmarkRule, maybeScale, scaleNames } from "../../src/core/index.ts";

describe("cover parameters", () => {
  it("lists the landmark rules greedy-file-order and greedy-shuffled, and the scaling zscore (the default) first", () => {
    expect(landmarkRules.slice(0, 2)).toEqual(["greedy-file-order", "greedy-shuffled"]);
    expect(scaleNames[0]).toBe("zscore");
  });

  it("maybeLandmarkRule and maybeScale return every listed name", () => {
    for (const rule of landmarkRules) expect(maybeLandmarkRule(rule)).toBe(rule);
    for (const scale of scaleNames) expect(maybeScale(scale)).toBe(scale);
  });

  it("maybeLandmarkRule maps the earlier names greedy and random to greedy-file-order and greedy-shuffled", () => {
    expect(maybeLandmarkRule("greedy")).toBe("greedy-file-order");
    expect(maybeLandmarkRule("random")).toBe("greedy-shuffled");
  });

  it("maybeLandmarkRule and maybeScale throw errors naming an unknown value, inherited names included", () => {
    expect(() => maybeLandmarkRule("farthest")).toThrow("invalid landmark rule: farthest");
    expect(() => maybeLandmarkRule("toString")).toThrow("invalid landmark rule: toString");
    expect(() => maybeScale("logistic")).toThrow("invalid scaling: logistic");
    expect(() => maybeScale("constructor")).toThrow("invalid scaling: constructor");
  });
});
