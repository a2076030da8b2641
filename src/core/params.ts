// Parameter names and types of a cover, and their normalizers; this module imports nothing.

/** Names of the metrics Shoal knows; one module per metric under core/metric/. */
export type MetricName = "euclidean" | "manhattan" | "chebyshev" | "cosine" | "correlation";

export type ScaleName = "none" | "zscore" | "minmax" | "robust";
export type LandmarkRule = "greedy-file-order" | "greedy-shuffled" | "maximin";
/** What happens to a row with a missing feature value, before scaling. */
export type MissingPolicy = "drop" | "median" | "mean";

/** Every parameter that decides a cover graph; together with the input file they reproduce it. */
export interface CoverParams {
  readonly features: readonly string[];
  readonly scale: ScaleName;
  readonly metric: MetricName;
  readonly radius: number;
  /** greedy-file-order: ε-net in file order; greedy-shuffled: ε-net in an order shuffled by `seed`; maximin: farthest point from a seeded start. */
  readonly landmarks: LandmarkRule;
  readonly seed: number;
  /** Factor per feature applied after scaling; absent features weigh 1. */
  readonly weights?: Readonly<Record<string, number>>;
  /** Default "drop". */
  readonly missing?: MissingPolicy;
  /** Categorical columns used as features through one indicator per level (worth the column's weight, default 1). */
  readonly oneHot?: readonly string[];
}

export const scaleNames: readonly ScaleName[] = ["zscore", "robust", "minmax", "none"];
export const landmarkRules: readonly LandmarkRule[] = ["greedy-file-order", "greedy-shuffled", "maximin"];
/** Earlier names, still accepted on the command line and in old recipes. */
export const landmarkRuleAliases: Readonly<Record<string, LandmarkRule>> = { greedy: "greedy-file-order", random: "greedy-shuffled" };
export const missingPolicies: readonly MissingPolicy[] = ["drop", "median", "mean"];

function maybeOneOf<T extends string>(names: readonly T[], what: string): (name: string) => T {
  return (name) => {
    if (!(names as readonly string[]).includes(name)) throw new Error(`invalid ${what}: ${name}`);
    return name as T;
  };
}

const maybeLandmarkRuleName = maybeOneOf(landmarkRules, "landmark rule");
export const maybeLandmarkRule = (name: string): LandmarkRule =>
  Object.hasOwn(landmarkRuleAliases, name) ? landmarkRuleAliases[name]! : maybeLandmarkRuleName(name);
export const maybeScale = maybeOneOf(scaleNames, "scaling");
export const maybeMissingPolicy = maybeOneOf(missingPolicies, "missing-value policy");

/** The weights that matter: only features (numeric or one-hot), and only factors other than 1 (so equal recipes compare equal). */
export function featureWeights(features: readonly string[], weights: Readonly<Record<string, number>>): Record<string, number> {
  return Object.fromEntries(features.flatMap((name) => (name in weights && weights[name] !== 1 ? [[name, weights[name]!]] : [])));
}
