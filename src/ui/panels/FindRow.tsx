import { useState } from "react";
import { actions } from "../../state/actions.ts";
import type { FindMode, RowPlace } from "../../state/findRow.ts";
import { selectRowPlace } from "../../state/regionSelectors.ts";
import { plural } from "../format.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** Find a row by its label or 1-based record number: the nodes holding it are marked and the view centres on them. */
export function FindRow() {
  const [mode, setMode] = useState<FindMode>("record");
  const [text, setText] = useState("");
  const place = useWorkbench(selectRowPlace);
  const built = useWorkbench((s) => s.result !== null);
  if (!built) return null;
  return (
    <form
      className="find-row"
      role="search"
      aria-label="find a row"
      onSubmit={(event) => {
        event.preventDefault();
        actions().findRow(text, mode);
      }}
    >
      <select aria-label="find by" value={mode} onChange={(e) => setMode(e.currentTarget.value as FindMode)}>
        <option value="record">record number</option>
        <option value="label">row label</option>
      </select>
      <input type="search" aria-label="row to find" placeholder={mode === "record" ? "e.g. 12" : "label"} value={text} onChange={(e) => setText(e.currentTarget.value)} />
      <button type="submit">Find</button>
      <output data-testid="find-row-result" aria-live="polite">
        {place === null ? "" : placeText(place)}
      </output>
    </form>
  );
}

/** The found row's nodes or why it is not in the build, after the note when a label matched several rows. */
function placeText(place: RowPlace): string {
  if (place.kind === "unknown") return place.reason;
  const where =
    place.kind === "found"
      ? `record ${place.row + 1} is in ${plural(place.nodes.length, "node")}: ${place.nodes.map((k) => k + 1).join(", ")}`
      : `record ${place.row + 1} is not in the build: ${place.reason}`;
  return place.note === undefined ? where : `${place.note}. ${where}`;
}
