/**
 * A named region: a set of rows, so it outlives the build it was made in (another radius, metric
 * or seed). Rows are 0-based parsed-table rows, ascending, each once; people see them as record
 * numbers (row + 1).
 */
export interface NamedRegion {
  /** Stable key, never reused within a session. */
  readonly id: number;
  readonly name: string;
  readonly rows: Uint32Array;
}

/** The last "find a row" query; the nodes holding the row are derived from the current build. */
export interface RowQuery {
  readonly query: string;
  readonly mode: "label" | "record";
}

export interface SelectionSlice {
  /** 0-based node index of the node open in the side pane; shown to people as node + 1. */
  readonly selectedNode: number | null;
  /** The selection: 0-based nodes of the current build, ascending; cleared by every rebuild. */
  readonly selection: readonly number[];
  /** Named regions, in the order they were kept. */
  readonly regions: readonly NamedRegion[];
  /** The region that shading, the sweep and the seed runs follow; null for none. */
  readonly activeRegionId: number | null;
  /** The row being looked for, or null; it outlives a rebuild (the nodes holding it are looked up again). */
  readonly rowQuery: RowQuery | null;
  /** What the middle of the screen shows: the graph or the table report. */
  readonly stage: "graph" | "report";
}

export const initialSelection: SelectionSlice = { selectedNode: null, selection: [], regions: [], activeRegionId: null, rowQuery: null, stage: "graph" };
