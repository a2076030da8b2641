import { csvLine, csvNumber, defaultRadius, featureWeights, radiusSweep, type CoverParams, type RadiusSweep } from "../core/index.ts";
import { resolveFeatures } from "./commonOptions.ts";
import type { SweepCommand } from "./parseSweepArgs.ts";
import { readInput } from "./readInput.ts";
import { writeFileWhole } from "./writeFileWhole.ts";
import { checkRecipeInput, needsFingerprint, recipeOfRun, recipeRegionRows, recipeToSave, saveRecipe } from "./recipeOfRun.ts";

export const sweepColumns = ["radius", "nodes", "edges", "components", "b0", "b1", "cycle_rank", "nodes_per_row", "largest_node_share", "largest_component_share", "plateau", "plateau_middle"];

/**
 * Runs a radius sweep over the table and returns the text for standard output: the per-radius
 * CSV, or with --out a one-line summary after the CSV is written next to the destination and
 * moved into place, so that a failure leaves nothing half written.
 */
export async function runSweep(command: SweepCommand): Promise<string> {
  const { table, fileName, fingerprint } = await readInput(command.input, command.read, needsFingerprint(command.recipe));
  checkRecipeInput(command.recipe, fileName, fingerprint);
  const features = resolveFeatures(table, command);
  // a sweep has no radius of its own: the recipe keeps the --recipe's, else the default-radius rule's
  const recipe = recipeToSave(command.recipe, () => {
    const weights = featureWeights([...features, ...(command.params.oneHot ?? [])], command.params.weights ?? {});
    const basis = { ...command.params, features, weights };
    const radius = command.recipe?.recipe?.radius ?? defaultRadius(table, basis);
    const params: CoverParams = { ...basis, missing: command.params.missing ?? "drop", radius };
    return recipeOfRun(command, { fileName, fingerprint: fingerprint!, read: command.read, params, regions: recipeRegionRows(command.recipe, table.rows) });
  });
  const sweep = radiusSweep(table, { ...command.params, features }, {
    steps: command.steps,
    ...(command.radiusMin === null ? {} : { radiusMin: command.radiusMin }),
    ...(command.radiusMax === null ? {} : { radiusMax: command.radiusMax }),
  });
  const csv = sweepCsv(sweep);
  if (command.outFile === null) {
    await saveRecipe(command.recipe, recipe);
    return csv;
  }
  await writeFileWhole(command.outFile, csv);
  const saved = await saveRecipe(command.recipe, recipe);
  const { suggestion } = sweep;
  const middle = suggestion ? `plateau middle ${suggestion.radius} (b0 ${suggestion.plateau.b0}, b1 ${suggestion.plateau.b1})` : "no plateau middle";
  return `${sweep.figures.radius.length} radii from ${sweep.range.min} to ${sweep.range.max}; ${sweep.plateaus.length} plateaus; ${middle}; rows used ${sweep.rowsUsed} of ${sweep.rowsRead}; wrote ${command.outFile}${saved}\n`;
}

/**
 * The per-radius table: one line per radius, ascending. `components` counts the connected
 * components of the graph, which is b0 of its nerve: both columns are kept, so a reader of either
 * name finds it. `plateau` numbers the runs of unchanged b0, b1 from 1 (0 outside a run);
 * `nodes_per_row` is the average number of nodes a row belongs to; `plateau_middle` is 1 on the
 * plateau middle, the middle of the widest eligible plateau.
 */
export function sweepCsv(sweep: RadiusSweep): string {
  const f = sweep.figures;
  const plateauOf = new Uint32Array(f.radius.length);
  sweep.plateaus.forEach((p, j) => plateauOf.fill(j + 1, p.first, p.last + 1));
  let out = csvLine(sweepColumns);
  for (let k = 0; k < f.radius.length; ++k) {
    const row = [f.radius[k]!, f.nodes[k]!, f.edges[k]!, f.b0[k]!, f.b0[k]!, f.b1[k]!, f.cycleRank[k]!, f.ballsPerRow[k]!, f.largestNodeShare[k]!, f.largestComponentShare[k]!, plateauOf[k]!, sweep.suggestion?.index === k ? 1 : 0];
    out += csvLine(row.map(csvNumber));
  }
  return out;
}
