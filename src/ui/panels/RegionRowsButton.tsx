import { actions } from "../../state/actions.ts";
import { downloadBytes } from "../download.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** region-rows.csv: every kept region's rows with their cells as written in the file, read again from it. */
export function RegionRowsButton() {
  const count = useWorkbench((s) => s.regions.length);
  const status = useWorkbench((s) => s.regionRowsStatus);
  return (
    <div className="region-rows">
      <button
        type="button"
        disabled={count === 0 || status.state === "running"}
        title="One CSV: region, row (record number), then every column with its cells exactly as in the file; a row in two regions appears twice"
        onClick={() => void actions().exportRegionRows((file) => downloadBytes(file.fileName, new TextEncoder().encode(file.text), "text/csv"))}
      >
        Export region rows (.csv)
      </button>
      <span className="export-note"> contains row-level data</span>
      {count === 0 && <span className="note"> Keep a region first.</span>}
      {status.state === "failed" && <span role="alert" className="error">Export failed: {status.error}</span>}
    </div>
  );
}
