import { useEffect } from "react";
import { actions } from "../state/actions.ts";
import { DropZone } from "./DropZone.tsx";
import { ColorLegend } from "./graph/ColorLegend.tsx";
import { ForceGraph } from "./graph/ForceGraph.tsx";
import { BuildSummary } from "./panels/BuildSummary.tsx";
import { Cautions } from "./panels/Cautions.tsx";
import { ColumnRoles } from "./panels/ColumnRoles.tsx";
import { CoverControls } from "./panels/CoverControls.tsx";
import { DrawingOrTable } from "./panels/DrawingOrTable.tsx";
import { FindRow } from "./panels/FindRow.tsx";
import { InspectorTabs } from "./panels/InspectorTabs.tsx";
import { RegionList } from "./panels/RegionList.tsx";
import { SelectionBar } from "./panels/SelectionBar.tsx";
import { SessionNotice } from "./panels/SessionNotice.tsx";
import { SessionRestorePrompt } from "./panels/SessionRestorePrompt.tsx";
import { SourceBar } from "./panels/SourceBar.tsx";
import { TableReport } from "./panels/TableReport.tsx";
import { UndoRedo } from "./panels/UndoRedo.tsx";
import { useWorkbench } from "./useWorkbench.ts";

/** The workbench: recipe on the left, graph in the middle, the open node on the right. */
export function App({ openDemo = true }: { openDemo?: boolean }) {
  const stage = useWorkbench((s) => s.stage);
  useEffect(() => {
    if (openDemo) void actions().startSession(); // the kept session, else the demo
  }, [openDemo]);
  return (
    <div className="workbench">
      <SourceBar />
      <aside className="recipe" aria-label="recipe">
        <UndoRedo />
        <CoverControls />
        <BuildSummary />
        <ColumnRoles />
        <SessionNotice />
      </aside>
      <main className="stage">
        <SessionRestorePrompt />
        {stage === "report" ? (
          <TableReport />
        ) : (
          <>
            <div className="region-tools">
              <SelectionBar />
              <FindRow />
              <RegionList />
            </div>
            <ColorLegend />
            <DrawingOrTable drawing={<ForceGraph />} />
          </>
        )}
      </main>
      <aside className="inspector" aria-label="side pane">
        <InspectorTabs />
      </aside>
      <Cautions />
      <DropZone />
    </div>
  );
}
