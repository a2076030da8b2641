import { useEffect } from "react";
import { actions } from "../../state/actions.ts";
import { isFlatScan, selectCandidateSets, selectExpectedScanMs, selectHotspotColumn, selectHotspotScan } from "../../state/hotspotSelectors.ts";
import { formatCount, formatNumber, plural } from "../format.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { HotspotList } from "./HotspotList.tsx";
import { HotspotSettings } from "./HotspotSettings.tsx";

/** "under a second", "about 12 s", "about 3.5 min". */
function roughDuration(ms: number): string {
  if (ms < 1000) return "under a second";
  if (ms < 120_000) return `about ${formatNumber(Number((ms / 1000).toPrecision(2)))} s`;
  return `about ${formatNumber(Number((ms / 60_000).toPrecision(2)))} min`;
}

/** Where the outcome concentrates on the graph, with p-values that account for the search: settings, the cost before a run, the run, the list. */
export function HotspotPane() {
  const result = useWorkbench((s) => s.result);
  const maxNodes = useWorkbench((s) => s.hotspotMaxNodes);
  const replicates = useWorkbench((s) => s.hotspotReplicates);
  const column = useWorkbench(selectHotspotColumn);
  const candidateSets = useWorkbench(selectCandidateSets);
  const expectedMs = useWorkbench(selectExpectedScanMs);
  const countFailed = useWorkbench((s) => s.hotspotEstimate.state === "failed" && s.hotspotEstimate.result === s.result);
  const status = useWorkbench((s) => s.hotspotScan);
  const buildRunning = useWorkbench((s) => s.build.state === "running");
  const scan = useWorkbench(selectHotspotScan);
  useEffect(() => {
    if (result) void actions().estimateHotspots();
  }, [result, maxNodes]);
  if (!result) return <section className="hotspot-pane" aria-label="hotspots" data-testid="hotspot-pane"><p className="note">Build a graph to scan it for hotspots.</p></section>;
  const params = result.params;
  return (
    <section className="hotspot-pane" aria-label="hotspots" data-testid="hotspot-pane">
      <HotspotSettings />
      <p className="note" data-testid="hotspot-estimate">
        {candidateSets === null
          ? countFailed ? "The candidate regions could not be counted." : "Counting the candidate regions…"
          : `${plural(candidateSets, "candidate set")} (K = ${maxNodes}), each scored for the data and ${formatCount(replicates)} permutations: ${roughDuration(expectedMs ?? 0)} expected (an estimate from rates measured once on the demo table).`}
      </p>
      <div className="stability-actions">
        <button type="button" onClick={() => void actions().runHotspotScan()} disabled={column === null || buildRunning || status.state === "running"}>
          Scan for hotspots
        </button>
      </div>
      {status.state === "running" && (
        <div className="progress" data-testid="hotspot-progress">
          <span>Scanning {column}…</span>
          <progress max={1} value={status.fraction} />
          <button type="button" onClick={() => actions().cancelHotspotScan()}>Cancel</button>
        </div>
      )}
      {status.state === "failed" && <p role="alert" className="error">The scan failed: {status.error}</p>}
      <p className="region-caution" data-testid="hotspot-accounting">
        The p-value accounts for the search over all candidate regions{scan?.search === "heuristic" ? " (the same heuristic search in every permutation)" : ""} at this radius ({formatNumber(params.radius)}), metric ({params.metric}) and scaling ({params.scale}); it does not account for choosing those parameters, nor for looking at several outcomes.
      </p>
      {scan && (
        <>
          <p className="note" data-testid="hotspot-rows">
            {plural(scan.rowsScanned, "row")} scanned; {plural(scan.rowsMissingOutcome, "row")} left out for a missing {scan.outcome}.
            {scan.search === "heuristic" && ` The ${formatCount(scan.candidateSets)} candidate sets passed the budget, so a heuristic search ran, the same one inside every permutation.`}
            {status.elapsedMs !== null && ` Took ${roughDuration(status.elapsedMs)}.`}
          </p>
          {isFlatScan(scan) && (
            <p className="note" data-testid="hotspot-flat">
              {scan.score === "bernoulli" ? "No cases or only cases among the scanned rows: every score is 0, p = 1." : `${scan.outcome} takes one value throughout the scanned rows: every score is 0, p = 1.`}
            </p>
          )}
          {scan.hotspots.length > 0 && <HotspotList scan={scan} />}
        </>
      )}
    </section>
  );
}
