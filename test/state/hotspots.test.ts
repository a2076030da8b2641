import { describe, expect, it } from "vitest";
import { createActions } from "../../src/state/actions.ts";
import { createHotspotActions } from "../../src/state/hotspotActions.ts";
import { bootstrapDrawsPerMs, expectedScanMs, selectCandidateSets, selectExpectedScanMs, selectHotspotColumn, selectHotspotScan, setsScoredPerMs } from "../../src/state/hotspotSelectors.ts";
import { createWorkbenchStore } from "../../src/state/store.ts";
import type { Answer, Request } from "../../src/worker/protocol.ts";
import { assertClose } from "../assertClose.ts";
import { fabricatedScan } from "./hotspotScanFixture.ts";
import { noDemo, parkingClient, steppingClock } from "./support.ts";

// Three groups along x (0–2, 10–11, 20–22); flag is a 0/1 outcome (missing in row 6), score a numeric one, site text.
const csv = "x,flag,score,site\n0,1,5,a\n1,1,6,a\n2,1,7,a\n10,0,1,b\n11,0,2,b\n20,0,3,c\n21,,4,c\n22,0,2,c\n";

async function built(colorBy: string | null = null) {
  const store = createWorkbenchStore();
  const parking = parkingClient(["hotspots", "hotspotEstimate"]);
  let regionId = 100;
  const env = { client: parking.client, fetchDemo: noDemo, now: steppingClock() };
  const actions = { ...createActions(store, env), ...createHotspotActions(store, { ...env, takeRegionId: () => regionId++ }) };
  await actions.loadText(csv, { fileName: "t.csv", fileSize: csv.length, isDemo: false }, { outcomes: ["flag", "score", "site"] }, colorBy);
  await actions.setRadius(0.3); // sd of x is about 9, so 0.3 z-units is about 2.7 raw: one node per group (worked by hand)
  return { store, actions, parking };
}

const scanned = (patch = {}) => (request: Request): Answer => ({ id: request.id, type: "hotspotsScanned", scan: fabricatedScan(patch) });

describe("hotspot actions", () => {
  it("the scan column defaults to the colour-by outcome when it is one, else the first numeric outcome (flag)", async () => {
    expect(selectHotspotColumn((await built("score")).store.getState())).toBe("score");
    const { store, actions } = await built(null);
    store.setState({ colorBy: "x" });
    expect(selectHotspotColumn(store.getState())).toBe("flag");
    await actions.setHotspotSettings({ hotspotColumn: "site" }); // a text outcome cannot be scanned
    expect(selectHotspotColumn(store.getState())).toBe("flag");
  });

  it("sends the scan settings with the build on screen, leaving the score out when it is auto", async () => {
    const { store, actions, parking } = await built(null);
    await actions.setHotspotSettings({ hotspotDirection: "both", hotspotReplicates: 199, hotspotScanSeed: 7 });
    void actions.runHotspotScan();
    const request = parking.sent.find((r) => r.type === "hotspots");
    expect(request).toEqual({ type: "hotspots", result: store.getState().result, options: { outcome: "flag", direction: "both", maxNodes: 8, replicates: 199, scanSeed: 7, stabilitySeeds: 0 } });
    expect(store.getState().hotspotScan.state).toBe("running");
  });

  it("keeps the answer for the build it scanned and shows it", async () => {
    const { store, actions, parking } = await built();
    const run = actions.runHotspotScan();
    await parking.release("hotspots", scanned());
    await run;
    expect(store.getState().hotspotScan.state).toBe("done");
    expect(selectHotspotScan(store.getState())?.hotspots.map((h) => h.rank)).toEqual([1, 2]);
  });

  it("drops a scan answer that arrives after a rebuild: the scan state is idle and no scan is shown", async () => {
    const { store, actions, parking } = await built();
    const run = actions.runHotspotScan();
    await actions.setRadius(0.35); // answered at once: a new result is on screen before the scan answers
    await parking.release("hotspots", scanned());
    await run;
    expect(store.getState().hotspotScan.state).toBe("idle");
    expect(selectHotspotScan(store.getState())).toBeNull();
  });

  it("a finished scan is no longer shown once another build is on screen", async () => {
    const { store, actions, parking } = await built();
    const run = actions.runHotspotScan();
    await parking.release("hotspots", scanned());
    await run;
    await actions.setRadius(0.35);
    expect(selectHotspotScan(store.getState())).toBeNull();
  });

  it("Cancel returns the scan to idle and drops its late answer", async () => {
    const { store, actions, parking } = await built();
    const run = actions.runHotspotScan();
    actions.cancelHotspotScan();
    await parking.release("hotspots", scanned());
    await run;
    expect(store.getState().hotspotScan).toMatchObject({ state: "idle", scan: null });
  });

  it("a scan ends a running sweep's progress (the scan takes the compute lane, so the sweep will get no answer)", async () => {
    const { store, actions } = await built();
    store.setState({ stability: { state: "running", task: "sweep", fraction: 0.3, error: null } });
    void actions.runHotspotScan();
    expect(store.getState().stability).toEqual({ state: "idle", task: null, fraction: 0, error: null });
  });

  it("a failed scan says why", async () => {
    const { store, actions, parking } = await built();
    const run = actions.runHotspotScan();
    await parking.release("hotspots", (request) => ({ id: request.id, type: "failed", message: "invalid max nodes: 16" }));
    await run;
    expect(store.getState().hotspotScan).toMatchObject({ state: "failed", error: "invalid max nodes: 16" });
  });

  it("does not start a scan while a build runs (the scan would cancel it)", async () => {
    const { store, actions, parking } = await built();
    store.setState({ build: { ...store.getState().build, state: "running" } });
    await actions.runHotspotScan();
    expect(parking.sent.some((r) => r.type === "hotspots")).toBe(false);
  });

  it("choosing hotspot 1 keeps region 'hotspot 1' with its rows, makes it active and selects its nodes", async () => {
    const { store, actions, parking } = await built();
    const run = actions.runHotspotScan();
    await parking.release("hotspots", scanned());
    await run;
    const region = actions.keepHotspot(1)!;
    const s = store.getState();
    expect(region.name).toBe("hotspot 1");
    expect(Array.from(region.rows)).toEqual([0, 1, 2]); // the fabricated hotspot's rows
    expect(s.regions).toEqual([region]);
    expect(s.activeRegionId).toBe(region.id);
    expect(s.selection).toEqual([0, 2]); // the fabricated hotspot's nodes
  });

  it("choosing the same hotspot again activates the region kept before instead of adding another", async () => {
    const { store, actions, parking } = await built();
    const run = actions.runHotspotScan();
    await parking.release("hotspots", scanned());
    await run;
    const first = actions.keepHotspot(1)!;
    actions.keepHotspot(2);
    expect(actions.keepHotspot(1)).toBe(first);
    expect(store.getState().regions.map((r) => r.name)).toEqual(["hotspot 1", "hotspot 2"]);
    expect(store.getState().activeRegionId).toBe(first.id);
  });

  it("a different hotspot of rank 1 from a later scan is kept as 'hotspot 1 (2)'", async () => {
    const { store, actions, parking } = await built();
    let run = actions.runHotspotScan();
    await parking.release("hotspots", scanned());
    await run;
    actions.keepHotspot(1);
    run = actions.runHotspotScan();
    await parking.release("hotspots", (request) => ({ id: request.id, type: "hotspotsScanned", scan: fabricatedScan({}, [{ rows: Uint32Array.of(5, 7), nodes: Uint32Array.of(2) }]) }));
    await run;
    expect(actions.keepHotspot(1)?.name).toBe("hotspot 1 (2)");
    expect(store.getState().selection).toEqual([2]);
  });

  it("keepHotspot of a rank the scan does not have keeps nothing (null)", async () => {
    const { store, actions } = await built();
    expect(actions.keepHotspot(1)).toBeNull();
    expect(store.getState().regions).toEqual([]);
  });

  it("the candidate count is kept for the build and K, and the expected time is sets × (replicates + 1) / rate plus the bootstrap's 8 rows × 2,000 × 10 draws / rate", async () => {
    const { store, actions, parking } = await built();
    const asked = actions.estimateHotspots();
    await parking.release("hotspotEstimate", (request) => ({ id: request.id, type: "hotspotEstimated", candidateSets: 40_000 }));
    await asked;
    expect(selectCandidateSets(store.getState())).toBe(40_000);
    assertClose(selectExpectedScanMs(store.getState())!, (40_000 * 1000) / setsScoredPerMs + (8 * 2000 * 10) / bootstrapDrawsPerMs); // 999 replicates + the data; all 8 rows used (worked by hand)
    void actions.setHotspotSettings({ hotspotMaxNodes: 10 }); // another K asks again (parked here): unknown until answered
    expect(selectCandidateSets(store.getState())).toBeNull();
  });

  it("a finished scan keeps its wall time (5 ms: the stepping clock moves 5 ms per call, test support)", async () => {
    const { store, actions, parking } = await built();
    const run = actions.runHotspotScan();
    await parking.release("hotspots", scanned());
    await run;
    expect(store.getState().hotspotScan.elapsedMs).toBe(5);
  });
});

describe("expected scan time", () => {
  it("8,400 sets × 1,000 scorings at 8,400 per ms is 1,000 ms (worked by hand)", () => {
    expect(expectedScanMs({ candidateSets: 8400, replicates: 999, stabilitySeeds: 0, rows: 0 })).toBe(1000);
  });

  it("each stability seed adds 100 scorings per set (99 replicates and the data): 10 seeds double the 1,000 ms to 2,000 ms (worked by hand)", () => {
    expect(expectedScanMs({ candidateSets: 8400, replicates: 999, stabilitySeeds: 10, rows: 0 })).toBe(2000);
  });

  it("the bootstrap of 2,349 rows adds 2,349 × 2,000 × 10 / 100,000 = 469.8 ms (worked by hand)", () => {
    assertClose(expectedScanMs({ candidateSets: 0, replicates: 999, stabilitySeeds: 0, rows: 2349 }), 469.8); // worked by hand
  });
});
