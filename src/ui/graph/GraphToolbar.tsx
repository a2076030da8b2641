import { useEffect, useRef } from "react";

export interface GraphToolbarProps {
  readonly onFit: () => void;
  readonly onZoom: (factor: number) => void;
  readonly zoomStep: number;
  readonly lassoMode: boolean;
  readonly onLassoMode: (on: boolean) => void;
  readonly layoutSeed: number;
  readonly onNewLayout: () => void;
  readonly pinned: number;
  readonly onUnpinAll: () => void;
  readonly edgeWidthByShared: boolean;
  readonly onEdgeWidthByShared: (on: boolean) => void;
}

// letters are text in a field and type-ahead in a list
const isTyping = (target: EventTarget | null): boolean =>
  target instanceof HTMLElement && (target.isContentEditable || ["INPUT", "TEXTAREA", "SELECT"].includes(target.tagName));

/** The view and layout commands over the graph; F fits from anywhere outside a text field or list. */
export function GraphToolbar(props: GraphToolbarProps) {
  const fit = useRef(props.onFit);
  fit.current = props.onFit;
  useEffect(() => {
    const onKey = (event: KeyboardEvent): void => {
      if (event.ctrlKey || event.metaKey || event.altKey || isTyping(event.target)) return;
      if (event.key === "f" || event.key === "F") fit.current();
    };
    document.addEventListener("keydown", onKey);
    return () => document.removeEventListener("keydown", onKey);
  }, []);
  return (
    <div className="graph-toolbar" role="toolbar" aria-label="graph view">
      <button type="button" aria-keyshortcuts="f" onClick={props.onFit}>
        Fit <kbd>F</kbd>
      </button>
      <button type="button" aria-label="zoom in" aria-keyshortcuts="+" onClick={() => props.onZoom(props.zoomStep)}>
        +
      </button>
      <button type="button" aria-label="zoom out" aria-keyshortcuts="-" onClick={() => props.onZoom(1 / props.zoomStep)}>
        −
      </button>
      <button type="button" aria-pressed={props.lassoMode} title="Drag on empty space draws a lasso instead of moving the view; shift-drag always draws one and adds" onClick={() => props.onLassoMode(!props.lassoMode)}>
        Lasso
      </button>
      <button type="button" title="Lay the graph out again from another start; pinned nodes stay" onClick={props.onNewLayout}>
        New layout <span className="graph-toolbar-note">#{props.layoutSeed}</span>
      </button>
      <button type="button" disabled={props.pinned === 0} onClick={props.onUnpinAll}>
        Unpin all{props.pinned > 0 ? ` (${props.pinned})` : ""}
      </button>
      <label>
        <input type="checkbox" checked={props.edgeWidthByShared} onChange={(e) => props.onEdgeWidthByShared(e.currentTarget.checked)} />
        Edge width by shared rows
      </label>
    </div>
  );
}
