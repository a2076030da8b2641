import type { CoverResult } from "../core/index.ts";
import type { WorkerClient } from "../worker/client.ts";
import type { HotspotSettings } from "../worker/protocol.ts";
import { selectHotspotColumn, selectHotspotScan } from "./hotspotSelectors.ts";
import type { HotspotSlice } from "./slices/hotspotSlice.ts";
import type { NamedRegion } from "./slices/selectionSlice.ts";
import type { WorkbenchStore } from "./store.ts";
import { answerError } from "./answerError.ts";

export type HotspotActions = ReturnType<typeof createHotspotActions>;

/** The scan settings a person can change. */
export type HotspotSettingsPatch = Partial<Pick<HotspotSlice,
  "hotspotColumn" | "hotspotDirection" | "hotspotMaxNodes" | "hotspotReplicates" | "hotspotScore" | "hotspotScanSeed" | "hotspotStabilitySeeds">>;

export interface HotspotEnvironment {
  readonly client: WorkerClient;
  readonly now: () => number;
  /** A region id never used before in this session (shared with the other ways of keeping a region). */
  readonly takeRegionId: () => number;
}

/**
 * Actions of the hotspot pane. The scan is a compute request: it cancels a running sweep or seed
 * run, and a newer build cancels it. Its answer is kept only while it is the latest scan and the
 * build it scanned is still on screen. The candidate count is a cheap view request, asked once per
 * build and K.
 */
export function createHotspotActions(store: WorkbenchStore, env: HotspotEnvironment) {
  let latestScan = 0;
  let latestEstimate = 0;
  const set = store.setState;
  const idle = { result: null, state: "idle", fraction: 0, scan: null, error: null, elapsedMs: null } as const;

  /** Asks the worker how many candidate sets the build on screen has at the chosen K, unless known or on its way. */
  async function estimateHotspots(): Promise<void> {
    const { result, hotspotMaxNodes: maxNodes, hotspotEstimate: known } = store.getState();
    if (!result) return;
    if (known.result === result && known.maxNodes === maxNodes && (known.state === "running" || known.state === "done")) return;
    const ticket = ++latestEstimate;
    set({ hotspotEstimate: { result, maxNodes, state: "running", candidateSets: null } });
    const answer = await env.client.send({ type: "hotspotEstimate", result, maxNodes });
    if (ticket !== latestEstimate) return;
    if (answer.type === "hotspotEstimated") set({ hotspotEstimate: { result, maxNodes, state: "done", candidateSets: answer.candidateSets } });
    else set({ hotspotEstimate: { result, maxNodes, state: "failed", candidateSets: null } });
  }

  /** Scans the build on screen for hotspots of the chosen outcome; nothing happens while a build runs (the scan would cancel it). */
  async function runHotspotScan(): Promise<void> {
    const s = store.getState();
    const outcome = selectHotspotColumn(s);
    const result: CoverResult | null = s.result;
    if (!result || !outcome || s.build.state === "running") return;
    const options: HotspotSettings = {
      outcome,
      direction: s.hotspotDirection,
      maxNodes: s.hotspotMaxNodes,
      replicates: s.hotspotReplicates,
      scanSeed: s.hotspotScanSeed,
      stabilitySeeds: s.hotspotStabilitySeeds,
      ...(s.hotspotScore === "auto" ? {} : { score: s.hotspotScore }),
    };
    const ticket = ++latestScan;
    // the scan takes the compute lane: a running sweep or seed run ends without an answer
    if (s.stability.state === "running") set({ stability: { state: "idle", task: null, fraction: 0, error: null } });
    const started = env.now();
    set({ hotspotScan: { ...idle, result, state: "running" } });
    const answer = await env.client.send({ type: "hotspots", result, options }, (progress) => {
      if (ticket === latestScan) set({ hotspotScan: { ...store.getState().hotspotScan, fraction: progress.fraction } });
    });
    if (ticket !== latestScan) return;
    const now = store.getState();
    // an answer about a build no longer on screen (a rebuild came in between) is dropped
    if (answer.type === "cancelled" || now.result !== result || now.build.state === "running") {
      set({ hotspotScan: idle });
      return;
    }
    if (answer.type !== "hotspotsScanned") {
      set({ hotspotScan: { ...idle, result, state: "failed", error: answerError(answer) } });
      return;
    }
    set({ hotspotScan: { result, state: "done", fraction: 1, scan: answer.scan, error: null, elapsedMs: env.now() - started } });
  }

  return {
    estimateHotspots,
    runHotspotScan,
    /** Changes scan settings; a new K asks for its candidate count. */
    setHotspotSettings(patch: HotspotSettingsPatch): Promise<void> {
      set(patch);
      return patch.hotspotMaxNodes === undefined ? Promise.resolve() : estimateHotspots();
    },
    /** Stops the running scan (the worker answers "cancelled"); the list shown before goes. */
    cancelHotspotScan(): void {
      latestScan++;
      env.client.cancel("compute");
      set({ hotspotScan: idle });
    },
    /**
     * Keeps the hotspot of this rank as a named region ("hotspot 1" for rank 1) holding the scanned
     * rows of its nodes, makes it the active region, and selects its nodes. Choosing it again
     * activates the region already kept. Null when the scan on screen has no such hotspot.
     */
    keepHotspot(rank: number): NamedRegion | null {
      const s = store.getState();
      const hotspot = selectHotspotScan(s)?.hotspots.find((h) => h.rank === rank);
      if (!hotspot) return null;
      const nodes = Array.from(hotspot.nodes);
      const same = s.regions.find((r) => r.rows.length === hotspot.rows.length && r.rows.every((row, i) => row === hotspot.rows[i]) && r.name.startsWith("hotspot "));
      if (same) {
        set({ activeRegionId: same.id, selection: nodes });
        return same;
      }
      const names = new Set(s.regions.map((r) => r.name));
      let name = `hotspot ${rank}`;
      for (let k = 2; names.has(name); ++k) name = `hotspot ${rank} (${k})`;
      const region: NamedRegion = { id: env.takeRegionId(), name, rows: hotspot.rows.slice() };
      set({ regions: [...s.regions, region], activeRegionId: region.id, selection: nodes });
      return region;
    },
  };
}

