import type { MetricName, ScaleName } from "../../core/index.ts";

const scaleUnits: Record<ScaleName, string> = {
  zscore: "standard deviations of each feature",
  robust: "interquartile ranges of each feature",
  minmax: "shares of each feature's range (0 to 1)",
  none: "the columns' own units, mixed",
};
const metricReading: Record<string, string> = {
  euclidean: "straight-line distance",
  manhattan: "sum of the differences",
  chebyshev: "largest single difference",
};
const unitless: Record<string, string> = {
  cosine: "1 − cosine of the angle between rows",
  correlation: "1 − correlation between rows",
};

/** One line saying what a radius of 1 means under this metric and scaling (weights multiply after scaling). */
export function radiusUnits(metric: MetricName, scale: ScaleName): string {
  const angle = unitless[metric];
  if (angle) return `Radius units: none; the distance is ${angle}, from 0 to 2, whatever the scaling.`;
  return `Radius units: ${scaleUnits[scale]}; ${metricReading[metric] ?? metric}, after weights.`;
}
