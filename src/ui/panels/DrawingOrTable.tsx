import { useState, type ReactNode } from "react";
import { NodeTable } from "./NodeTable.tsx";

/**
 * The graph shown as the drawing or as the node table, by a two-button switch above it. The drawing
 * stays mounted (hidden) while the table shows, so its layout is kept.
 */
export function DrawingOrTable({ drawing }: { drawing: ReactNode }) {
  const [view, setView] = useState<"drawing" | "table">("drawing");
  return (
    <>
      <div className="view-switch" role="group" aria-label="show the graph as">
        <button type="button" aria-pressed={view === "drawing"} onClick={() => setView("drawing")}>Drawing</button>
        <button type="button" aria-pressed={view === "table"} onClick={() => setView("table")}>Node table</button>
      </div>
      <div className="drawing" hidden={view !== "drawing"}>{drawing}</div>
      {view === "table" ? <NodeTable /> : null}
    </>
  );
}
