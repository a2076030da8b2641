export interface SelectionSlice {
  /** 0-based node index of the node open in the side pane; shown to people as node + 1. */
  readonly selectedNode: number | null;
  /** The region: nodes whose member rows together form the selection that stability tracks (0-based). */
  readonly regionNodes: readonly number[];
  /** What the middle of the screen shows: the graph or the table report. */
  readonly stage: "graph" | "report";
}

export const initialSelection: SelectionSlice = { selectedNode: null, regionNodes: [], stage: "graph" };
