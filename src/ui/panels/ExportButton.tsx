import { actions } from "../../state/actions.ts";
import { downloadBytes } from "../download.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** One zip: nodes.csv, members.csv (the node membership table), edges.csv and summary.json. */
export function ExportButton() {
  const ready = useWorkbench((s) => s.result !== null);
  const status = useWorkbench((s) => s.exportStatus);
  return (
    <>
      <button
        type="button"
        className="primary export"
        disabled={!ready || status.state === "running"}
        title="nodes.csv, members.csv, edges.csv and summary.json in one zip (format described in the README); members.csv lists the rows of every node"
        onClick={() => void actions().exportCover((file) => downloadBytes(file.fileName, file.bytes, "application/zip"))}
      >
        <span>Export tables (.zip)</span>{" "}
        <span className="export-note">contains row-level data</span>
      </button>
      {status.state === "failed" && <span role="alert" className="error">Export failed: {status.error}</span>}
    </>
  );
}
