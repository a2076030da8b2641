import { useDeferredValue, useMemo, useState } from "react";
import { actions } from "../../state/actions.ts";
import { nodeTableOrder, selectNodeTable } from "../../state/nodeTable.ts";
import { formatCount, formatNumber } from "../format.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** Rows rendered at once; a larger graph shows the first ones in the chosen order. */
export const maxTableRows = 1000;

type Direction = "ascending" | "descending";
const nodeKey = "@node";

/**
 * The drawing as a table, for reading by keyboard and screen reader: one row per node with its
 * size, colour value and column means; each heading's button sorts by that column (again to reverse),
 * and a row's button opens the node.
 */
export function NodeTable() {
  const latest = useWorkbench(selectNodeTable);
  const selected = useWorkbench((s) => s.selectedNode);
  const table = useDeferredValue(latest);
  // while the table still shows an older result, its buttons would open nodes of the new one
  const stale = table !== latest;
  const [sort, setSort] = useState<{ key: string; direction: Direction }>({ key: nodeKey, direction: "ascending" });
  const column = table?.columns.find((c) => c.key === sort.key);
  const order = useMemo(() => {
    if (!table) return new Uint32Array(0);
    return column ? nodeTableOrder(column.values, sort.direction) : nodeTableOrder(Float64Array.from({ length: table.nodes }, (_, k) => k), sort.direction);
  }, [table, column, sort.direction]);
  if (!table) return <p className="note">No graph yet.</p>;
  const sortBy = (key: string): void =>
    setSort((now) => ({ key, direction: now.key === key ? (now.direction === "ascending" ? "descending" : "ascending") : key === nodeKey ? "ascending" : "descending" }));
  const heading = (key: string, label: string) => {
    const active = key === sort.key || (key === nodeKey && !column);
    return (
      <th key={key} scope="col" aria-sort={active ? sort.direction : undefined}>
        <button type="button" className="sort" onClick={() => sortBy(key)}>
          {label}
          <span aria-hidden="true">{active ? (sort.direction === "ascending" ? " ▲" : " ▼") : ""}</span>
        </button>
      </th>
    );
  };
  const shown = order.subarray(0, maxTableRows);
  return (
    <div className="node-table" data-testid="node-table" aria-busy={stale}>
      <p className="note" id="node-table-help">
        A heading&apos;s button sorts by its column (press again to reverse); a node&apos;s button opens it.
        {table.nodes > maxTableRows ? ` The first ${formatCount(maxTableRows)} in this order are listed; sort to bring others up.` : ""}
      </p>
      <table aria-describedby="node-table-help">
        <caption>Nodes ({formatCount(table.nodes)})</caption>
        <thead>
          <tr>
            {heading(nodeKey, "node")}
            {table.columns.map((c) => heading(c.key, c.label))}
          </tr>
        </thead>
        <tbody>
          {Array.from(shown, (k) => (
            <tr key={k} aria-current={selected === k ? "true" : undefined}>
              <th scope="row">
                <button type="button" disabled={stale} onClick={() => void actions().selectNode(k)}>Node {k + 1}</button>
              </th>
              {table.columns.map((c) => <td key={c.key}>{c.key === "@size" ? formatCount(c.values[k]!) : formatNumber(c.values[k]!)}</td>)}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
