import { delimiterNames, featureWeights, recipeSchemaVersion, shoalVersion, type Recipe, type RecipeColour, type RecipeHotspots } from "../core/index.ts";
import { levelsColor, regionColor } from "./colorChoices.ts";
import { selectHotspotColumn, selectHotspotScan } from "./hotspotSelectors.ts";
import { selectFeatureNames, selectIdColumn, selectOneHotNames, selectOutcomeNames } from "./selectors.ts";
import type { WorkbenchState } from "./store.ts";

/** True when `recipeFromState` has a recipe to give (a table read and hashed, and a radius). */
export const selectCanWriteRecipe = (s: WorkbenchState): boolean => s.table !== null && s.source !== null && s.inputFingerprint !== null && s.radius > 0;

/**
 * The recipe of what the workbench shows: the input's fingerprint, the reading options chosen,
 * roles, weights, parameters, colour, named regions (by record number) and, when a scan of the
 * graph on screen was run, the hotspot settings. Null until a table is loaded, hashed and given a
 * radius. Pure: `applyRecipe` (recipeActions.ts) is its inverse on the same table.
 */
export function recipeFromState(s: WorkbenchState, writtenBy = `shoal ${shoalVersion}`): Recipe | null {
  if (!selectCanWriteRecipe(s) || !s.table || !s.source || !s.inputFingerprint) return null;
  const features = selectFeatureNames(s);
  const oneHot = selectOneHotNames(s);
  const { delimiter, decimal, encoding, ragged } = s.readOptions;
  const scanned = selectHotspotScan(s) === null ? null : hotspotSettings(s);
  return {
    shoalRecipe: recipeSchemaVersion,
    writtenBy,
    input: { name: s.source.fileName, bytes: s.inputFingerprint.bytes, sha256: s.inputFingerprint.sha256 },
    reading: { delimiter: delimiter === undefined ? null : delimiterNames[delimiter], decimal: decimal ?? null, encoding: encoding ?? null, ragged: ragged ?? "reject" },
    columns: { features, id: selectIdColumn(s), outcomes: selectOutcomeNames(s), oneHot, weights: featureWeights([...features, ...oneHot], s.weights) },
    missing: s.missing,
    scale: s.scale,
    metric: s.metric,
    radius: s.radius,
    landmarks: { rule: s.landmarks, seed: s.seed },
    colour: colourOf(s),
    regions: s.regions.map((r) => ({ name: r.name, records: Array.from(r.rows, (row) => row + 1) })),
    ...(scanned ? { hotspots: scanned } : {}),
  };
}

// the stability colouring needs a seed run, which a recipe does not hold: it is written as none
function colourOf(s: WorkbenchState): RecipeColour {
  const { colorBy, colorLevel: level } = s;
  if (colorBy === null) return { kind: "none", name: null, level: null };
  const region = s.regions.find((r) => regionColor(r.id) === colorBy);
  if (region) return { kind: "region", name: region.name, level: null };
  const levels = s.table?.columns.find((c) => levelsColor(c.name) === colorBy);
  if (levels) return { kind: "levels", name: levels.name, level };
  if (s.table?.columns.some((c) => c.name === colorBy)) return { kind: "column", name: colorBy, level };
  return { kind: "none", name: null, level: null };
}

function hotspotSettings(s: WorkbenchState): RecipeHotspots | null {
  const column = selectHotspotColumn(s);
  if (column === null) return null;
  return {
    column, direction: s.hotspotDirection, maxNodes: s.hotspotMaxNodes, replicates: s.hotspotReplicates,
    score: s.hotspotScore, scanSeed: s.hotspotScanSeed, stabilitySeeds: s.hotspotStabilitySeeds,
  };
}
