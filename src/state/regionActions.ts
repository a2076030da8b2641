import { componentNodes, growByOneStep, majorityNodes } from "../core/index.ts";
import type { FindMode } from "./findRow.ts";
import type { WorkbenchStore } from "./store.ts";

/** How a set of nodes meets the selection: replace it, or add to it (shift-drag, shift+Enter). */
export type SelectMode = "replace" | "add";

/**
 * Selection commands over the current build (lasso, component, one step further, a region's
 * nodes) and "find a row". None of them calls the worker: they only set the store.
 */
export function createRegionActions(store: WorkbenchStore) {
  const set = store.setState;
  const nodeCount = (): number => store.getState().result?.landmarks.length ?? 0;

  function selectNodes(nodes: readonly number[], mode: SelectMode = "replace"): void {
    const n = nodeCount();
    const chosen = new Set(nodes.filter((k) => Number.isInteger(k) && k >= 0 && k < n));
    if (mode === "add") for (const k of store.getState().selection) chosen.add(k);
    set({ selection: [...chosen].sort((a, b) => a - b) });
  }

  return {
    selectNodes,
    /** Adds the node to the selection, or takes it out if it is in (shift-click, shift+Enter in the node list). */
    toggleNode(node: number): void {
      const { selection } = store.getState();
      if (selection.includes(node)) set({ selection: selection.filter((k) => k !== node) });
      else selectNodes([node], "add");
    },
    /** Selects the whole connected component of every selected node (or of the open node when nothing is selected). */
    selectComponent(): void {
      const s = store.getState();
      const seeds = s.selection.length > 0 ? s.selection : s.selectedNode === null ? [] : [s.selectedNode];
      if (s.result && seeds.length > 0) selectNodes(componentNodes(s.result, seeds));
    },
    /** Adds every neighbour of the selection (or of the open node when nothing is selected). */
    growSelection(): void {
      const s = store.getState();
      const seeds = s.selection.length > 0 ? s.selection : s.selectedNode === null ? [] : [s.selectedNode];
      if (s.result && seeds.length > 0) selectNodes(growByOneStep(s.result, seeds));
    },
    /** Selects the nodes most of whose rows lie in the region (exactly half is not most). */
    selectRegionNodes(id: number): void {
      const s = store.getState();
      const region = s.regions.find((r) => r.id === id);
      if (s.result && region) selectNodes(majorityNodes(s.result.members, region.rows, s.result.rowsRead));
    },
    /** Looks a row up by label or 1-based record number; an empty query ends the search. */
    findRow(query: string, mode: FindMode): void {
      set({ rowQuery: query.trim() === "" ? null : { query, mode } });
    },
  };
}
