import type { Recipe } from "./types.ts";

/**
 * The recipe file's text: keys always in the schema's order (whatever order the object was built
 * in), weights in the order of the features then the one-hot columns, 2-space indent, a trailing
 * newline. Equal recipes give equal bytes.
 */
export function recipeToJson(recipe: Recipe): string {
  const { columns, hotspots } = recipe;
  const weighed = [...columns.features, ...columns.oneHot].filter((name) => Object.hasOwn(columns.weights, name));
  const ordered = {
    shoalRecipe: recipe.shoalRecipe,
    writtenBy: recipe.writtenBy,
    input: { name: recipe.input.name, bytes: recipe.input.bytes, sha256: recipe.input.sha256 },
    reading: { delimiter: recipe.reading.delimiter, decimal: recipe.reading.decimal, encoding: recipe.reading.encoding, ragged: recipe.reading.ragged },
    columns: {
      features: [...columns.features],
      id: columns.id,
      outcomes: [...columns.outcomes],
      oneHot: [...columns.oneHot],
      weights: Object.fromEntries(weighed.map((name) => [name, columns.weights[name]!])),
    },
    missing: recipe.missing,
    scale: recipe.scale,
    metric: recipe.metric,
    radius: recipe.radius,
    landmarks: { rule: recipe.landmarks.rule, seed: recipe.landmarks.seed },
    colour: { kind: recipe.colour.kind, name: recipe.colour.name, level: recipe.colour.level },
    regions: recipe.regions.map((region) => ({ name: region.name, records: [...region.records] })),
    ...(hotspots
      ? {
          hotspots: {
            column: hotspots.column, direction: hotspots.direction, maxNodes: hotspots.maxNodes, replicates: hotspots.replicates,
            score: hotspots.score, scanSeed: hotspots.scanSeed, stabilitySeeds: hotspots.stabilitySeeds,
          },
        }
      : {}),
  };
  return `${JSON.stringify(ordered, null, 2)}\n`;
}
