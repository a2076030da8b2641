import { formatCount, plural } from "../format.ts";
import { actions } from "../../state/actions.ts";
import { selectHasFeatures } from "../../state/selectors.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** Progress while the worker builds, then the graph's counts and every row left out. */
export function BuildSummary() {
  const build = useWorkbench((s) => s.build);
  const result = useWorkbench((s) => s.result);
  const noFeatures = useWorkbench((s) => s.table !== null && !selectHasFeatures(s));
  return (
    <section className="build-summary" aria-live="polite">
      {build.state === "running" && (
        <div className="progress" data-testid="build-progress">
          <span>Building{build.phase ? `: ${build.phase}` : "…"}</span>
          <progress max={1} value={build.fraction} />
          <button type="button" onClick={() => actions().cancelBuild()}>Cancel</button>
        </div>
      )}
      {noFeatures && <p role="alert" className="error">Choose at least one feature column to build a graph.</p>}
      {build.state === "failed" && <p role="alert" className="error">Build failed: {build.error}</p>}
      {result && (
        <dl className="counts" data-testid="graph-counts">
          <div><dt>nodes</dt><dd data-testid="node-count">{formatCount(result.landmarks.length)}</dd></div>
          <div><dt>edges</dt><dd data-testid="edge-count">{formatCount(result.edges.source.length)}</dd></div>
          <div className="wide"><dt>components (b0)</dt><dd data-testid="component-count">{formatCount(result.componentCount)}</dd></div>
          <div><dt>loops (b1)</dt><dd data-testid="b1">{result.betti ? formatCount(result.betti.b1) : "–"}</dd></div>
          <div><dt>cycle rank</dt><dd data-testid="cycle-rank">{formatCount(result.cycleRank)}</dd></div>
          <div className="wide">
            <dt>rows used</dt>
            <dd>{formatCount(result.usedRows.length)} of {formatCount(result.rowsRead)}</dd>
          </div>
        </dl>
      )}
      {result && (
        <p className="loops-note">
          A ball is the set of rows within the radius of one landmark; each node is one ball. Cycle rank counts every triangle of
          overlapping balls as a loop; b1 counts loops once triples of balls sharing a row are filled in. Both describe this
          sample: three balls overlapping in pairs with no row in all three add a loop.
        </p>
      )}
      {result && result.undefinedRows.length > 0 && (
        <p className="note" data-testid="undefined-note">
          {plural(result.undefinedRows.length, "row")} left out because the {result.params.metric} distance is undefined on
          them (rows {Array.from(result.undefinedRows.subarray(0, 8), (r) => r + 1).join(", ")}
          {result.undefinedRows.length > 8 ? ", …" : ""}).
        </p>
      )}
      {result && Object.values(result.imputed).some((n) => n > 0) && (
        <p className="note">
          Filled in ({result.params.missing}):{" "}
          {Object.entries(result.imputed).filter(([, n]) => n > 0).map(([name, n]) => `${name} ${n}`).join(", ")}.
        </p>
      )}
      {result && result.droppedRows.length > 0 && (
        <p className="note" data-testid="dropped-note">
          {plural(result.droppedRows.length, "row")} left out for a missing feature value (rows{" "}
          {Array.from(result.droppedRows.subarray(0, 8), (r) => r + 1).join(", ")}
          {result.droppedRows.length > 8 ? ", …" : ""}); they keep their row numbers in every export.
        </p>
      )}
      {result && result.constantColumns.length > 0 && (
        <p className="note">Constant columns set to 0: {result.constantColumns.join(", ")}.</p>
      )}
      {build.elapsedMs !== null && <p className="note">Built in {Math.round(build.elapsedMs)} ms.</p>}
    </section>
  );
}
