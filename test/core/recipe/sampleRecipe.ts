import type { Recipe } from "../../../src/core/index.ts";

/** A complete, valid recipe (invented values) for the recipe tests. */
export const sampleRecipe: Recipe = Object.freeze({
  shoalRecipe: 1,
  writtenBy: "shoal 0.1.0",
  input: { name: "pumps.csv", bytes: 1234, sha256: "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad" },
  reading: { delimiter: null, decimal: null, encoding: null, ragged: "reject" },
  columns: { features: ["a", "b"], id: "name", outcomes: ["y"], oneHot: ["kind"], weights: { b: 2 } },
  missing: "drop",
  scale: "zscore",
  metric: "euclidean",
  radius: 0.5,
  landmarks: { rule: "greedy-file-order", seed: 1 },
  colour: { kind: "column", name: "y", level: null },
  regions: [{ name: "Region A", records: [1, 3, 4] }],
  hotspots: { column: "y", direction: "high", maxNodes: 8, replicates: 999, score: "auto", scanSeed: 1, stabilitySeeds: 0 },
} satisfies Recipe);

/** The sample as plain JSON with one field replaced at a dotted path (for the one-message-per-field tests). */
export function withField(path: string, value: unknown): Record<string, unknown> {
  const copy = JSON.parse(JSON.stringify(sampleRecipe)) as Record<string, unknown>;
  const keys = path.split(".");
  let target = copy as Record<string, unknown>;
  for (const key of keys.slice(0, -1)) target = target[key] as Record<string, unknown>;
  if (value === undefined) delete target[keys.at(-1)!];
  else target[keys.at(-1)!] = value;
  return copy;
}
