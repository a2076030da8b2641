import { actions } from "../../state/actions.ts";
import { downloadBytes } from "../download.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** One zip: nodes.csv, members.csv (the node membership table), edges.csv and summary.json. */
export function ExportButton() {
  const ready = useWorkbench((s) => s.result !== null);
  return (
    <button
      type="button"
      className="primary export"
      disabled={!ready}
      title="nodes.csv, members.csv, edges.csv and summary.json in one zip (format described in the README); members.csv lists the rows of every node"
      onClick={() => {
        const file = actions().exportCover();
        if (file) downloadBytes(file.fileName, file.bytes, "application/zip");
      }}
    >
      <span>Export tables (.zip)</span>{" "}
      <span className="export-note">contains row-level data</span>
    </button>
  );
}
