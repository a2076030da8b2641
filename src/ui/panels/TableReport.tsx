import { formatCount, formatNumber } from "../format.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { ReadingOptions } from "./ReadingOptions.tsx";
import { roleLabel } from "./roleLabel.ts";

const typeLabel = { numeric: "numeric", categorical: "categorical", identifier: "identifier-like", empty: "empty" } as const;

/** What the reader made of the file: format, every column's type and counts, flagged cells and notices. */
export function TableReport() {
  const report = useWorkbench((s) => s.report);
  const roles = useWorkbench((s) => s.roles);
  if (!report) return <p className="note">No table is loaded.</p>;
  const flagged = report.columns.flatMap((c) => c.flagged);
  return (
    <section className="table-report" aria-label="table report" data-testid="table-report" tabIndex={0}>
      <ReadingOptions />
      {report.notices.length > 0 && (
        <ul className="notices" aria-label="notices">
          {report.notices.map((n, k) => <li key={k}>{n.message}</li>)}
        </ul>
      )}
      <table>
        <thead>
          <tr>
            <th scope="col">column</th><th scope="col">type</th><th scope="col">role</th><th scope="col">missing</th>
            <th scope="col">distinct</th><th scope="col">min</th><th scope="col">max</th><th scope="col">first values</th>
          </tr>
        </thead>
        <tbody>
          {report.columns.map((c) => (
            <tr key={c.name}>
              <th scope="row" title={c.header === c.name ? undefined : `header in the file: ${c.header}`}>{c.name}</th>
              <td>{typeLabel[c.type]}{c.looksLikeRowNumber && <span className="row-number-flag" title="distinct whole numbers, consecutive or written as ids: suggested role row label"> · looks like a row number</span>}</td>
              <td>{roleLabel(roles[c.name] ?? "ignore", c.type === "numeric")}</td>
              <td>{formatCount(c.missing)}</td>
              <td>{c.distinctAtLeast ? "≥ " : ""}{formatCount(c.distinct)}</td>
              <td>{formatNumber(c.min)}</td>
              <td>{formatNumber(c.max)}</td>
              <td className="first-values">{c.firstValues.join(", ")}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {flagged.length > 0 && (
        <>
          <h2>Cells counted as missing</h2>
          <p className="note">Text in a numeric column, and tokens such as NA, NaN or Inf, count as missing values. The first few per column:</p>
          <table>
            <thead><tr><th scope="col">row</th><th scope="col">line</th><th scope="col">column</th><th scope="col">text</th></tr></thead>
            <tbody>
              {flagged.map((cell, k) => (
                <tr key={k}><td>{cell.row}</td><td>{cell.line ?? "–"}</td><td>{cell.column}</td><td><code>{cell.text}</code></td></tr>
              ))}
            </tbody>
          </table>
        </>
      )}
      <p className="note">
        {formatCount(report.rows)} data records{report.lines === null ? "" : ` on ${formatCount(report.lines)} lines`}. Change a column's role in the Columns list on the left.
      </p>
    </section>
  );
}
