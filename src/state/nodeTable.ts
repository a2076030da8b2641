import { nodeMeans, type ParsedTable } from "../core/index.ts";
import { memoizeLast } from "./memoizeLast.ts";
import { selectNodeFill, selectStatsColumns } from "./selectors.ts";
import type { WorkbenchState } from "./store.ts";

/** One sortable column of the node table: its heading and a number per node (NaN where the node has none). */
export interface NodeTableColumn {
  readonly key: string;
  readonly label: string;
  readonly values: Float64Array;
}

/** The node table: size, the colour value when it is a number, then the node mean of every numeric column shown in the node pane. */
export interface NodeTable {
  readonly nodes: number;
  readonly columns: readonly NodeTableColumn[];
}

// the member counts and column means depend on the result and the columns only, not on the colour
const memoMeans = memoizeLast((table: ParsedTable | null, result: WorkbenchState["result"], columns: readonly string[]): NodeTableColumn[] | null => {
  if (!table || !result) return null;
  const { offsets } = result.members;
  const nodes = result.landmarks.length;
  const sizes = new Float64Array(nodes);
  for (let k = 0; k < nodes; ++k) sizes[k] = offsets[k + 1]! - offsets[k]!;
  const out: NodeTableColumn[] = [{ key: "@size", label: "rows", values: sizes }];
  for (const name of columns) {
    const column = table.columns.find((c) => c.name === name);
    if (column) out.push({ key: `mean:${name}`, label: `mean ${name}`, values: nodeMeans(column.numbers, result.members) });
  }
  return out;
});

const memoTable = memoizeLast((counted: NodeTableColumn[] | null, nodes: number, colour: Float64Array | null, colourCaption: string | null): NodeTable | null => {
  if (!counted) return null;
  const [size, ...means] = counted;
  const colourColumn = colour && colourCaption ? [{ key: "@colour", label: `colour: ${colourCaption}`, values: colour }] : [];
  return { nodes, columns: [size!, ...colourColumn, ...means] };
});

/**
 * The node table's columns, derived from the result: member counts, the colour values (when the
 * fill is numeric) and node means of the node pane's columns (`nodeMeans`, O(memberships) each, on
 * the main thread; computed only while the table is shown, once per result and column list, not
 * again when only the colour changes).
 */
export function selectNodeTable(s: WorkbenchState): NodeTable | null {
  const fill = selectNodeFill(s);
  const numeric = fill?.kind === "sequential" ? fill : null;
  return memoTable(memoMeans(s.table, s.result, memoColumns(selectStatsColumns(s))), s.result?.landmarks.length ?? 0, numeric?.values ?? null, numeric?.caption ?? null);
}

// selectStatsColumns builds a new array on every call: keep the last one while its names are the same
let lastColumns: readonly string[] = [];
function memoColumns(columns: readonly string[]): readonly string[] {
  if (columns.length !== lastColumns.length || columns.some((name, i) => name !== lastColumns[i])) lastColumns = columns;
  return lastColumns;
}

/**
 * Node order for a sorted column: by value (ascending or descending), nodes without a value
 * (NaN) last in either direction, ties by node number, so the order is stable and total. O(n log n).
 * @example nodeTableOrder(Float64Array.of(3, NaN, 1, 3), "descending") // => Uint32Array [0, 3, 2, 1]
 */
export function nodeTableOrder(values: Float64Array, direction: "ascending" | "descending"): Uint32Array {
  const order = Uint32Array.from({ length: values.length }, (_, k) => k);
  const sign = direction === "ascending" ? 1 : -1;
  return order.sort((a, b) => {
    const x = values[a]!;
    const y = values[b]!;
    if (Number.isNaN(x) || Number.isNaN(y)) return Number.isNaN(x) === Number.isNaN(y) ? a - b : Number.isNaN(x) ? 1 : -1;
    return x === y ? a - b : sign * (x < y ? -1 : 1);
  });
}
