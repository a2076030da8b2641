import { useEffect } from "react";
import { actions } from "../../state/actions.ts";
import { plural } from "../format.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** The selection commands, each with the key that runs it anywhere outside a text field or list. */
const commands = [
  { key: "c", label: "Select component", run: () => actions().selectComponent() },
  { key: "g", label: "Grow one step", run: () => actions().growSelection() },
  { key: "k", label: "Keep as region", run: () => void actions().keepSelectionAsRegion() },
  { key: "Escape", label: "Clear", run: () => actions().clearRegion() },
] as const;

const isTyping = (target: EventTarget | null): boolean =>
  target instanceof HTMLElement && (target.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(target.tagName));

/** How many nodes are selected, and the commands on it (buttons with their shortcut keys). */
export function SelectionBar() {
  const count = useWorkbench((s) => s.selection.length);
  const built = useWorkbench((s) => s.result !== null);
  useEffect(() => {
    const onKey = (event: KeyboardEvent): void => {
      if (event.ctrlKey || event.metaKey || event.altKey) return;
      // letters are type-ahead in a list and text in a field; Escape still clears from the node list
      if (isTyping(event.target) && !(event.key === "Escape" && event.target instanceof HTMLSelectElement)) return;
      commands.find((c) => c.key === event.key || c.key === event.key.toLowerCase())?.run();
    };
    document.addEventListener("keydown", onKey);
    return () => document.removeEventListener("keydown", onKey);
  }, []);
  if (!built) return null;
  return (
    <div className="selection-bar" role="toolbar" aria-label="selection">
      <span data-testid="selection-count">{count === 0 ? "No node selected" : `${plural(count, "node")} selected`}</span>
      {commands.map((c) => (
        <button key={c.key} type="button" aria-keyshortcuts={c.key} disabled={c.key === "k" && count === 0} onClick={c.run}>
          {c.label} <kbd>{c.key === "Escape" ? "Esc" : c.key.toUpperCase()}</kbd>
        </button>
      ))}
    </div>
  );
}
