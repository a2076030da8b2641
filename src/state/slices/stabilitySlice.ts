import type { RadiusSweep, RegionTrack, SeedStability } from "../../core/index.ts";

export interface StabilityStatus {
  readonly state: "idle" | "running" | "failed";
  readonly task: "sweep" | "seeds" | null;
  readonly fraction: number;
  readonly error: string | null;
}

export interface StabilitySlice {
  /** Sweep settings: ends (null: the default range rule) and the number of log-spaced radii. */
  readonly sweepMin: number | null;
  readonly sweepMax: number | null;
  readonly sweepSteps: number;
  readonly seedCount: number;
  readonly sweep: RadiusSweep | null;
  /** The region's Jaccard track over the sweep, when a region was selected as it ran. */
  readonly region: RegionTrack | null;
  readonly seedRuns: SeedStability | null;
  readonly stability: StabilityStatus;
}

export const initialStability: StabilitySlice = {
  sweepMin: null,
  sweepMax: null,
  sweepSteps: 24,
  seedCount: 10,
  sweep: null,
  region: null,
  seedRuns: null,
  stability: { state: "idle", task: null, fraction: 0, error: null },
};
