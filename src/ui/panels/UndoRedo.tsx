import { useEffect } from "react";
import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";

// inputs that take no typed text: there the browser has no undo of its own, so ours applies
const notTyped = new Set(["checkbox", "radio", "range", "button", "submit", "reset", "color", "file"]);

/** True in a field where the browser's own undo of typed text applies. */
export const isTextField = (target: EventTarget | null): boolean =>
  target instanceof HTMLElement &&
  (target.isContentEditable || target.tagName === "TEXTAREA" || (target instanceof HTMLInputElement && !notTyped.has(target.type)));

/** Which history step a key press asks for: Ctrl/⌘+Z undoes, Ctrl/⌘+Shift+Z and Ctrl/⌘+Y redo. */
export function historyKey(event: Pick<KeyboardEvent, "key" | "ctrlKey" | "metaKey" | "shiftKey" | "altKey">): "undo" | "redo" | null {
  if (!(event.ctrlKey || event.metaKey) || event.altKey) return null;
  const key = event.key.toLowerCase();
  if (key === "z") return event.shiftKey ? "redo" : "undo";
  if (key === "y" && !event.shiftKey) return "redo";
  return null;
}

/** Undo and redo of parameter, role, colour, region and selection changes: two buttons and their keys. */
export function UndoRedo() {
  const undoDepth = useWorkbench((s) => s.undoDepth);
  const redoDepth = useWorkbench((s) => s.redoDepth);
  useEffect(() => {
    const onKey = (event: KeyboardEvent): void => {
      const step = historyKey(event);
      if (step === null || isTextField(event.target)) return;
      event.preventDefault();
      void (step === "undo" ? actions().undo() : actions().redo());
    };
    document.addEventListener("keydown", onKey);
    return () => document.removeEventListener("keydown", onKey);
  }, []);
  return (
    <div className="undo-redo" role="group" aria-label="history">
      <button type="button" aria-label="Undo" aria-keyshortcuts="Control+Z" title={`Undo (Ctrl+Z); ${undoDepth} steps back`} disabled={undoDepth === 0} onClick={() => void actions().undo()}>
        ↶ Undo
      </button>
      <button type="button" aria-label="Redo" aria-keyshortcuts="Control+Shift+Z Control+Y" title={`Redo (Ctrl+Shift+Z or Ctrl+Y); ${redoDepth} steps forward`} disabled={redoDepth === 0} onClick={() => void actions().redo()}>
        ↷ Redo
      </button>
    </div>
  );
}
