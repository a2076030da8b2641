import { useEffect } from "react";
import { actions } from "../../state/actions.ts";
import { selectExplainedRegion, selectRegionPane } from "../../state/regionPaneSelectors.ts";
import { plural } from "../format.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { RegionLevelsView } from "./RegionLevelsView.tsx";
import { RegionRowsButton } from "./RegionRowsButton.tsx";
import { RegionTableView } from "./RegionTableView.tsx";

/** What sets the region apart: the worker's region table of the active region (or the selection) against the rest or another region. */
export function RegionPane() {
  const explained = useWorkbench(selectExplainedRegion);
  const pane = useWorkbench(selectRegionPane);
  const result = useWorkbench((s) => s.result);
  const regions = useWorkbench((s) => s.regions);
  useEffect(() => {
    if (explained && result) void actions().explainRegion();
  }, [explained, result]);
  if (!explained) {
    return (
      <section className="region-pane" aria-label="region" data-testid="region-pane">
        <p className="note">Select nodes (shift-click) or make a region active to see what sets its rows apart from the others.</p>
        <RegionRowsButton />
      </section>
    );
  }
  const versus = explained.versus;
  const otherName = versus ? versus.name : "the rest";
  const table = pane.table;
  const numeric = table ? table.lines.filter((l) => l.kind === "numeric") : [];
  const categorical = table ? table.lines.filter((l) => l.kind === "categorical") : [];
  return (
    <section className="region-pane" aria-label="region" data-testid="region-pane">
      <header>
        <h2>{explained.name}</h2>
        {explained.id === null && <button type="button" onClick={() => actions().keepSelectionAsRegion()}>Keep as region</button>}
      </header>
      <p data-testid="region-size">{plural(explained.rows.length, "row")}</p>
      <label className="region-versus">
        Compare with
        <select value={versus?.id ?? ""} onChange={(e) => void actions().setVersusRegion(e.currentTarget.value === "" ? null : Number(e.currentTarget.value))}>
          <option value="">the rest of the rows</option>
          {regions.filter((r) => r.id !== explained.id).map((r) => <option key={r.id} value={r.id}>{r.name}</option>)}
        </select>
      </label>
      {pane.state === "running" && <p className="note">Comparing…</p>}
      {pane.state === "failed" && <p role="alert" className="error">The comparison failed: {pane.error}</p>}
      {table && (
        <>
          <ul className="region-counts" data-testid="region-counts">
            <li>{plural(table.rowsInside, "row")} in the region, {plural(table.rowsOutside, "row")} in {otherName}</li>
            {versus && <li data-testid="region-in-both">{plural(table.inBoth, "row")} in both regions, left out of both sides</li>}
            <li data-testid="region-unused">
              {plural(table.rowsUnused, "row")} left out of the build, in neither side
              {table.regionRowsUnused > 0 ? ` (${table.regionRowsUnused} of them in the region${versus ? "s" : ""})` : ""}
            </li>
          </ul>
          <p className="region-caution" data-testid="region-caution">
            This region was picked by looking at the same data, so these figures describe how it differs; they are not confirmatory tests, and the p-values come out small more often than they would for a region chosen beforehand.
          </p>
          <RegionTableView lines={numeric} curves={pane.curves} otherName={otherName} versusLabel={versus ? `d vs ${versus.name}` : "d vs rest"} />
          <RegionLevelsView lines={categorical} otherName={otherName} />
          {table.skipped.length > 0 && <p className="note">Not compared: {table.skipped.map((s) => `${s.column} (${s.reason === "empty" ? "empty" : "every value differs"})`).join(", ")}.</p>}
        </>
      )}
      <RegionRowsButton />
    </section>
  );
}
