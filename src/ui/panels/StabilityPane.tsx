import { actions } from "../../state/actions.ts";
import { formatNumber, plural } from "../format.ts";
import { SweepChart } from "../graph/SweepChart.tsx";
import { useWorkbench } from "../useWorkbench.ts";
import { SeedSummary } from "./SeedSummary.tsx";
import { SweepNotes } from "./SweepNotes.tsx";
import { SweepSettings } from "./SweepSettings.tsx";

/** Evidence that the picture holds: the radius sweep, the region's match across radii, and seed stability. */
export function StabilityPane() {
  const sweep = useWorkbench((s) => s.sweep);
  const region = useWorkbench((s) => s.region);
  const radius = useWorkbench((s) => s.radius);
  const status = useWorkbench((s) => s.stability);
  const regionSize = useWorkbench((s) => s.selection.length);
  const seed = useWorkbench((s) => s.seed);
  return (
    <section className="stability-pane" aria-label="stability" data-testid="stability-pane">
      <SweepSettings />
      <p className="note">
        {regionSize > 0
          ? `Region: ${plural(regionSize, "node")} (shift-click nodes to add or remove); the sweep tracks how well it is matched at each radius.`
          : "Select a region (shift-click nodes, or \"Add to region\" in a node's pane) to track it across radii and seeds."}
      </p>
      <div className="stability-actions">
        <button type="button" onClick={() => void actions().runSweep()} disabled={status.state === "running"}>Sweep radii</button>
        <button type="button" onClick={() => void actions().runSeedStability()} disabled={status.state === "running"} aria-describedby="seed-run-note">
          Rebuild with other seeds
        </button>
      </div>
      <p id="seed-run-note" className="note">
        The seed rebuilds always use the greedy, seeded shuffle order (seeds {seed}, {seed + 1}, …), whatever landmark order is chosen above.
      </p>
      {status.state === "running" && (
        <div className="progress" data-testid="stability-progress">
          <span>{status.task === "sweep" ? "Sweeping radii…" : "Rebuilding with other seeds…"}</span>
          <progress max={1} value={status.fraction} />
          <button type="button" onClick={() => actions().cancelStability()}>Cancel</button>
        </div>
      )}
      {status.state === "failed" && <p role="alert" className="error">{status.error}</p>}
      {sweep && (
        <>
          <SweepChart sweep={sweep} region={region} radius={radius} onPick={(r) => void actions().setRadius(r)} />
          <SweepNotes sweep={sweep} hasRegion={region !== null} />
          <label className="sweep-jump">
            Rebuild at a swept radius
            <select value="" onChange={(e) => e.currentTarget.value && void actions().setRadius(Number(e.currentTarget.value))}>
              <option value="">choose…</option>
              {Array.from(sweep.figures.radius, (r, k) => (
                <option key={k} value={r}>
                  {formatNumber(r)} · {sweep.figures.nodes[k]} nodes · {plural(sweep.figures.b0[k]!, "component")} · b1 {sweep.figures.b1[k]}
                  {sweep.suggestion?.index === k ? " · plateau middle" : ""}
                </option>
              ))}
            </select>
          </label>
        </>
      )}
      <SeedSummary />
    </section>
  );
}
