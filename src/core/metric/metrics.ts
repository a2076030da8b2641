import { chebyshev } from "./chebyshev.ts";
import { correlation } from "./correlation.ts";
import { cosine } from "./cosine.ts";
import { euclidean } from "./euclidean.ts";
import { manhattan } from "./manhattan.ts";
import type { Metric, MetricName } from "./types.ts";

/** The registry: adding a metric is one module plus one line here. */
export const metrics: Readonly<Record<MetricName, Metric>> = { euclidean, manhattan, chebyshev, cosine, correlation };

export const metricNames = Object.keys(metrics) as MetricName[];

export function maybeMetric(name: string): Metric {
  const metric = Object.hasOwn(metrics, name) ? metrics[name as MetricName] : undefined;
  if (!metric) throw new Error(`invalid metric: ${name}`);
  return metric;
}
