export interface SelectionSlice {
  /** 0-based node index of the node open in the side pane; shown to people as node + 1. */
  readonly selectedNode: number | null;
}

export const initialSelection: SelectionSlice = { selectedNode: null };
