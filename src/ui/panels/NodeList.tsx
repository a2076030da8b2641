import { useDeferredValue, useMemo } from "react";
import { actions } from "../../state/actions.ts";
import { selectNodeColorValues } from "../../state/selectors.ts";
import { formatNumber, plural } from "../format.ts";
import { maxDrawnNodes } from "../graph/drawLimits.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** Keyboard route to every node: a native list box (arrow keys move, the choice opens the node, shift+Enter adds it to the selection). */
export function NodeList() {
  const latest = useWorkbench((s) => s.result);
  const selected = useWorkbench((s) => s.selectedNode);
  const latestColors = useWorkbench(selectNodeColorValues);
  const latestColorBy = useWorkbench((s) => s.colorBy);
  // a thousand options are rendered in the background (interruptible), not in the task that brought the result
  const shown = useMemo(() => ({ result: latest, colors: latestColors, colorBy: latestColorBy }), [latest, latestColors, latestColorBy]);
  const { result, colors, colorBy } = useDeferredValue(shown);
  // while the list still shows an older result, a choice in it would open a node of the new one
  const stale = result !== latest;
  if (!result) return null;
  const { offsets } = result.members;
  if (result.landmarks.length > maxDrawnNodes) {
    return (
      <label className="node-list">
        <span>Node number (1 to {result.landmarks.length.toLocaleString("en-US")})</span>
        <input
          type="number"
          min={1}
          max={result.landmarks.length}
          aria-label="node number"
          disabled={stale}
          value={selected === null ? "" : selected + 1}
          onChange={(e) => {
            const k = Number(e.currentTarget.value) - 1;
            if (Number.isInteger(k) && k >= 0 && k < result.landmarks.length) actions().selectNode(k);
          }}
        />
      </label>
    );
  }
  return (
    <label className="node-list">
      <span>Nodes ({result.landmarks.length})</span>
      <select
        size={8}
        aria-label="nodes"
        disabled={stale}
        aria-busy={stale}
        value={selected === null || stale ? "" : String(selected)}
        onChange={(e) => actions().selectNode(Number(e.currentTarget.value))}
        onKeyDown={(e) => {
          // shift+Enter adds the open node to the selection, or takes it out: the keyboard's lasso
          if (e.key !== "Enter" || !e.shiftKey || e.currentTarget.value === "") return;
          e.preventDefault();
          actions().toggleNode(Number(e.currentTarget.value));
        }}
      >
        <option value="" disabled>no node open</option>
        {Array.from(result.landmarks, (_, k) => (
          <option key={k} value={k}>
            Node {k + 1} · {plural(offsets[k + 1]! - offsets[k]!, "row")}
            {colors && colorBy ? ` · ${colorBy} ${formatNumber(colors[k]!)}` : ""}
          </option>
        ))}
      </select>
    </label>
  );
}
