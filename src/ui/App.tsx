import { useEffect } from "react";
import { actions } from "../state/actions.ts";
import { DropZone } from "./DropZone.tsx";
import { ColorLegend } from "./graph/ColorLegend.tsx";
import { ForceGraph } from "./graph/ForceGraph.tsx";
import { BuildSummary } from "./panels/BuildSummary.tsx";
import { Cautions } from "./panels/Cautions.tsx";
import { ColumnRoles } from "./panels/ColumnRoles.tsx";
import { CoverControls } from "./panels/CoverControls.tsx";
import { NodeList } from "./panels/NodeList.tsx";
import { NodePane } from "./panels/NodePane.tsx";
import { SourceBar } from "./panels/SourceBar.tsx";

/** The workbench: recipe on the left, graph in the middle, the open node on the right. */
export function App({ openDemo = true }: { openDemo?: boolean }) {
  useEffect(() => {
    if (openDemo) void actions().loadDemo();
  }, [openDemo]);
  return (
    <div className="workbench">
      <SourceBar />
      <aside className="recipe" aria-label="recipe">
        <CoverControls />
        <BuildSummary />
        <ColumnRoles />
      </aside>
      <main className="stage">
        <ColorLegend />
        <ForceGraph />
      </main>
      <aside className="inspector" aria-label="node details">
        <NodeList />
        <NodePane />
      </aside>
      <Cautions />
      <DropZone />
    </div>
  );
}
