import { describe, expect, it } from "vitest";
import { euclidean, maybeMetric, metricNames, metrics } from "../../../src/core/index.ts";

describe("metric registry", () => {
  it("lists euclidean, and every registered metric carries its own name", () => {
    expect(metricNames).toContain("euclidean");
    expect(metrics.euclidean).toBe(euclidean);
    for (const name of metricNames) expect(metrics[name].name).toBe(name);
  });

  it("maybeMetric returns the registered metric by name", () => {
    for (const name of metricNames) expect(maybeMetric(name)).toBe(metrics[name]);
  });

  it("maybeMetric throws an error naming an unknown metric", () => {
    expect(() => maybeMetric("hamming")).toThrow("invalid metric: hamming");
    expect(() => maybeMetric("")).toThrow("invalid metric: ");
  });

  it("maybeMetric throws for names inherited from Object.prototype, such as toString and constructor", () => {
    expect(() => maybeMetric("toString")).toThrow("invalid metric: toString");
    expect(() => maybeMetric("constructor")).toThrow("invalid metric: constructor");
    expect(() => maybeMetric("__proto__")).toThrow("invalid metric: __proto__");
  });
});
