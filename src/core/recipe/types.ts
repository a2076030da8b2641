import type { HotspotDirection, HotspotScore } from "../hotspots/types.ts";
import type { MetricName } from "../metric/types.ts";
import type { LandmarkRule, MissingPolicy, ScaleName } from "../params.ts";
import type { TextEncodingName } from "../encoding/detectEncoding.ts";
import type { DecimalMark, DelimiterName, RaggedPolicy } from "../table/readOptions.ts";

/** Schema version of the recipe file; a reader refuses a newer one. */
export const recipeSchemaVersion = 1;

/** The file a recipe was made on: its name, size in bytes and SHA-256 of its bytes (lowercase hex). */
export interface RecipeInput {
  readonly name: string;
  readonly bytes: number;
  readonly sha256: string;
}

/** Reading options that were chosen; null where the reader detects the value. */
export interface RecipeReading {
  readonly delimiter: DelimiterName | null;
  readonly decimal: DecimalMark | null;
  readonly encoding: TextEncodingName | null;
  readonly ragged: RaggedPolicy;
}

export interface RecipeColumns {
  /** Numeric feature columns, in the order they are used. */
  readonly features: readonly string[];
  readonly id: string | null;
  readonly outcomes: readonly string[];
  /** Categorical columns used as features through one 0/1 column per level. */
  readonly oneHot: readonly string[];
  /** Factor per feature after scaling; a feature not named weighs 1. */
  readonly weights: Readonly<Record<string, number>>;
}

/** What colours the nodes: nothing, a column (mean or level), a numeric column read as categories, or a named region's share. */
export interface RecipeColour {
  readonly kind: "none" | "column" | "levels" | "region";
  /** The column's or region's name; null for "none". */
  readonly name: string | null;
  /** For a categorical colouring: the level whose share colours the nodes; null for each node's majority level. */
  readonly level: string | null;
}

/** A named region by its 1-based record numbers, ascending, each once. */
export interface RecipeRegion {
  readonly name: string;
  readonly records: readonly number[];
}

/** The hotspot search's settings. */
export interface RecipeHotspots {
  readonly column: string;
  readonly direction: HotspotDirection;
  readonly maxNodes: number;
  readonly replicates: number;
  /** "auto": Bernoulli for a 0/1 outcome, otherwise normal. */
  readonly score: HotspotScore | "auto";
  readonly scanSeed: number;
  readonly stabilitySeeds: number;
}

/** Everything that decides a graph, so that the same recipe on the same file gives the same files (README, "Recipes"). */
export interface Recipe {
  readonly shoalRecipe: typeof recipeSchemaVersion;
  /** The program that wrote it, e.g. "shoal 0.1.0". */
  readonly writtenBy: string;
  readonly input: RecipeInput;
  readonly reading: RecipeReading;
  readonly columns: RecipeColumns;
  readonly missing: MissingPolicy;
  readonly scale: ScaleName;
  readonly metric: MetricName;
  readonly radius: number;
  readonly landmarks: { readonly rule: LandmarkRule; readonly seed: number };
  readonly colour: RecipeColour;
  readonly regions: readonly RecipeRegion[];
  /** Present when a hotspot search was run. */
  readonly hotspots?: RecipeHotspots;
}
