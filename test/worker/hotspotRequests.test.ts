import { beforeEach, describe, expect, it, vi } from "vitest";
import { buildCover, countCandidateSets, scanHotspots, type HotspotOptions } from "../../src/core/index.ts";
import type * as Core from "../../src/core/index.ts";
import { createHandler, transferables } from "../../src/worker/handle.ts";
import { lane, laneOf, type Answer, type Progress, type Request } from "../../src/worker/protocol.ts";
import { fabricatedScan } from "../state/hotspotScanFixture.ts";
import { loadText, now } from "./answers.ts";

// The engine lands separately: here its two entry points are stand-ins that record their arguments,
// report progress and honour cancellation, so the test checks only the routing.
vi.mock("../../src/core/index.ts", async (importOriginal) => {
  const original = await importOriginal<typeof Core>();
  return {
    ...original,
    scanHotspots: vi.fn((_parsed: unknown, _result: unknown, options: HotspotOptions) => {
      options.onProgress?.(0.5);
      if (options.shouldStop?.()) throw new original.Cancelled("the hotspot scan");
      options.onProgress?.(1);
      return fabricatedScan();
    }),
    countCandidateSets: vi.fn(() => 40),
  };
});

const csv = "x,flag\n0,1\n1,1\n2,0\n10,0\n11,0\n";
const ignore = (): void => {};

function loadedHandler(isStopped: (request: Request) => boolean = () => false) {
  const handle = createHandler({ now: () => 0, progressInterval: 0, isStopped });
  const loaded = now(handle(loadText(1, csv), ignore));
  if (loaded.type !== "loaded") throw new Error("the table did not load");
  const built = now(handle({ id: 2, type: "build", params: { features: ["x"], scale: "none", metric: "euclidean", radius: 1.5, landmarks: "greedy-file-order", seed: 1 } }, ignore));
  if (built.type !== "built") throw new Error("the table did not build");
  return { handle, table: loaded.table, result: built.result };
}

describe("worker: hotspot requests", () => {
  beforeEach(() => {
    vi.mocked(scanHotspots).mockClear();
  });

  it("routes 'hotspots' to scanHotspots with the loaded table, the build and the settings, and answers its scan", () => {
    const { handle, table, result } = loadedHandler();
    const options = { outcome: "flag", direction: "high", maxNodes: 8, replicates: 199, scanSeed: 3, stabilitySeeds: 0 } as const;
    const answer = now(handle({ id: 3, type: "hotspots", result, options }, ignore));
    expect(answer).toEqual({ id: 3, type: "hotspotsScanned", scan: fabricatedScan() });
    const [parsed, scanned, passed] = vi.mocked(scanHotspots).mock.calls[0]!;
    expect(parsed).toBe(table);
    expect(scanned).toBe(result);
    expect(passed).toMatchObject(options);
  });

  it("reports the scan's progress as phase 'hotspots' (0.5 then 1, from the stand-in)", () => {
    const { handle, result } = loadedHandler();
    const reports: Progress[] = [];
    now(handle({ id: 3, type: "hotspots", result, options: { outcome: "flag" } }, (p) => reports.push(p)));
    expect(reports.map((p) => [p.phase, p.fraction])).toEqual([["hotspots", 0.5], ["hotspots", 1]]);
  });

  it("a scan stopped while it runs answers 'cancelled'", () => {
    let stopScan = false;
    const { handle, result } = loadedHandler((request) => request.type === "hotspots" && stopScan);
    const answer = now(handle({ id: 3, type: "hotspots", result, options: { outcome: "flag" } }, () => void (stopScan = true)));
    expect(answer).toEqual({ id: 3, type: "cancelled" });
  });

  it("routes 'hotspotEstimate' to countCandidateSets with the table, the build and K, and answers the count (40, the stand-in's)", () => {
    const { handle, table, result } = loadedHandler();
    expect(now(handle({ id: 3, type: "hotspotEstimate", result, maxNodes: 10 }, ignore))).toEqual({ id: 3, type: "hotspotEstimated", candidateSets: 40 });
    expect(vi.mocked(countCandidateSets)).toHaveBeenCalledWith(table, result, 10);
  });

  it("a scan is a compute request (a newer build cancels it) and the count a view request (it cancels nothing)", () => {
    expect(laneOf("hotspots")).toBe(lane.compute);
    expect(laneOf("hotspotEstimate")).toBe(lane.view);
  });

  it("the scan answer transfers each hotspot's node and row buffers", () => {
    const scan = fabricatedScan();
    const answer: Answer = { id: 1, type: "hotspotsScanned", scan };
    expect(transferables(answer)).toEqual(scan.hotspots.flatMap((h) => [h.nodes.buffer, h.rows.buffer]));
  });

  it("the real build is untouched by the stand-ins (buildCover is core's own)", () => {
    expect(vi.isMockFunction(buildCover)).toBe(false);
  });
});
