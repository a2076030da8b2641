import type { WorkerClient } from "../worker/client.ts";
import type { TableSource } from "../worker/protocol.ts";
import { selectExplainedRegion, selectRegionPane } from "./regionPaneSelectors.ts";
import { selectIdColumn } from "./selectors.ts";
import type { WorkbenchStore } from "./store.ts";
import { answerError, fileStem } from "./answerError.ts";

/** The export of region-rows.csv as the worker wrote it. */
export interface RegionRowsFile {
  readonly fileName: string;
  readonly text: string;
}

export type RegionPaneActions = ReturnType<typeof createRegionPaneActions>;

/**
 * Actions of the region pane: the worker's region table of the explained region (a newer request
 * wins; an older answer is dropped) and region-rows.csv, whose cells the worker reads again from
 * `loadedSource()`, the text or file the current table was loaded from.
 */
export function createRegionPaneActions(store: WorkbenchStore, env: { readonly client: WorkerClient }, loadedSource: () => TableSource | null) {
  let latestTable = 0;
  let latestRows = 0;
  const set = store.setState;

  /** Asks the worker for the explained region's table, unless it is here or on its way. */
  async function explainRegion(): Promise<void> {
    const s = store.getState();
    const explained = selectExplainedRegion(s);
    const { result, table } = s;
    if (!explained || !result || !table) return;
    const status = selectRegionPane(s).state;
    if (status === "running" || status === "done") return;
    const ticket = ++latestTable;
    const versus = explained.versus?.rows ?? null;
    const pane = { rows: explained.rows, versus, result };
    set({ regionPane: { ...pane, state: "running", table: null, curves: [], error: null } });
    const answer = await env.client.send({ type: "regionTable", rowsRead: result.rowsRead, usedRows: result.usedRows, region: explained.rows, versus, labelColumn: selectIdColumn(s) });
    if (ticket !== latestTable) return;
    if (answer.type === "regionTabled") set({ regionPane: { ...pane, state: "done", table: answer.table, curves: answer.curves, error: null } });
    else set({ regionPane: { ...pane, state: "failed", table: null, curves: [], error: answerError(answer) } });
  }

  return {
    explainRegion,
    /** "A vs B" with a named region, or "A vs rest" with null. */
    setVersusRegion(versusRegionId: number | null): Promise<void> {
      set({ versusRegionId });
      return explainRegion();
    },
    /**
     * region-rows.csv of every named region, written by the worker and handed to `save` (the page's
     * download); null when there is no region or table, a newer export was asked for, or on failure
     * (then `regionRowsStatus` says why).
     */
    async exportRegionRows(save: (file: RegionRowsFile) => void = () => {}): Promise<RegionRowsFile | null> {
      const s = store.getState();
      const source = loadedSource();
      if (!s.table || !s.report || !s.source || !source || s.regions.length === 0) return null;
      const ticket = ++latestRows;
      set({ regionRowsStatus: { state: "running", error: null } });
      const regions = s.regions.map((r) => ({ name: r.name, rows: r.rows }));
      const answer = await env.client.send({ type: "regionRows", source, format: s.report.format, encoding: s.readOptions.encoding ?? null, regions });
      if (ticket !== latestRows) return null;
      if (answer.type !== "regionRowsWritten") {
        set({ regionRowsStatus: { state: "failed", error: answerError(answer) } });
        return null;
      }
      const stem = fileStem(s.source.fileName);
      const file = { fileName: `${stem}-region-rows.csv`, text: answer.csv };
      try {
        save(file);
      } catch (error) {
        set({ regionRowsStatus: { state: "failed", error: `the file could not be saved: ${error instanceof Error ? error.message : String(error)}` } });
        return null;
      }
      set({ regionRowsStatus: { state: "idle", error: null } });
      return file;
    },
  };
}

