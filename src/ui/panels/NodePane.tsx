import { actions } from "../../state/actions.ts";
import { selectNodeDetail } from "../../state/selectors.ts";
import { formatCount, formatNumber } from "../format.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** Member statistics of the open node, per column: centre and spread, quartiles, and its difference from all rows. */
export function NodePane() {
  const detail = useWorkbench(selectNodeDetail);
  const inRegion = useWorkbench((s) => detail !== null && s.selection.includes(detail.node));
  if (!detail) return <p className="note">Click a node in the graph, or choose one in the list above, to see its members.</p>;
  return (
    <section className="node-pane" aria-labelledby="node-title" data-testid="node-pane">
      <header>
        <h2 id="node-title">Node {detail.node + 1}</h2>
        <button type="button" className="quiet" aria-label="close node" onClick={() => actions().selectNode(null)}>×</button>
      </header>
      <p>
        <span data-testid="node-size">{formatCount(detail.size)}</span> member rows · landmark is row {detail.landmarkRow + 1} ·
        component {detail.component + 1}
      </p>
      <button type="button" onClick={() => actions().selectNode(detail.node, true)}>
        {inRegion ? "Remove from region" : "Add to region"}
      </button>
      {detail.statsState === "running" && <p className="note">Computing member statistics…</p>}
      {detail.statsState === "failed" && <p role="alert" className="error">Member statistics failed: {detail.statsError}</p>}
      <table>
        <thead>
          <tr>
            <th scope="col">column</th><th scope="col">mean</th><th scope="col">sd</th><th scope="col">median</th>
            <th scope="col" title="(node mean − mean of all rows) / sd of all rows">Δ in sd</th>
          </tr>
        </thead>
        <tbody>
          {detail.columns.map(({ name, role, summary, standardisedDifference }) => (
            <tr key={name} className={`role-${role}`}>
              <th scope="row">{name}{role === "outcome" && <span className="role-tag">outcome</span>}</th>
              <td>{formatNumber(summary.mean)}</td>
              <td>{formatNumber(summary.sd)}</td>
              <td>{formatNumber(summary.median)}</td>
              <td className={Math.abs(standardisedDifference) >= 1 ? "strong" : undefined}>{formatNumber(standardisedDifference)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      <p className="note" data-testid="bold-note">
        Δ in sd: (node mean − mean of all rows) / sd of all rows. Bold where |Δ| ≥ 1, a large difference; bold is not statistical significance.
      </p>
      <details>
        <summary>Quartiles and range</summary>
        <table>
          <thead>
            <tr><th scope="col">column</th><th scope="col">min</th><th scope="col">Q1</th><th scope="col">median</th><th scope="col">Q3</th><th scope="col">max</th><th scope="col">missing</th></tr>
          </thead>
          <tbody>
            {detail.columns.map(({ name, summary }) => (
              <tr key={name}>
                <th scope="row">{name}</th>
                <td>{formatNumber(summary.min)}</td><td>{formatNumber(summary.q1)}</td><td>{formatNumber(summary.median)}</td>
                <td>{formatNumber(summary.q3)}</td><td>{formatNumber(summary.max)}</td><td>{summary.missing}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p className="note">Quartiles by linear interpolation (Hyndman–Fan type 7); sd divides by n − 1.</p>
      </details>
    </section>
  );
}
