import { Fragment } from "react";
import type { RegionTableLine } from "../../core/index.ts";
import type { RegionCurve } from "../../worker/protocol.ts";
import { formatCount, formatNumber } from "../format.ts";
import { formatP } from "../formatP.ts";
import { EcdfPlot, insideStroke, outsideStroke } from "./EcdfPlot.tsx";

/** How the KS p-value is computed, said once for the column's tooltip (the README's region pane section says the same). */
export const ksPChoices =
  "The exact p (when m·n ≤ 10,000) is computed as if there were no ties, which makes it conservative; beyond that it is the asymptotic Kolmogorov distribution at √(mn/(m+n))·D, without Stephens' small-sample correction.";

type NumericLine = Extract<RegionTableLine, { kind: "numeric" }>;

/** The numeric lines of a region table, in the worker's order (largest D first), each with its two-CDF plot and a line of detail. */
export function RegionTableView({ lines, curves, otherName, versusLabel }: { lines: readonly NumericLine[]; curves: readonly RegionCurve[]; otherName: string; versusLabel: string }) {
  if (lines.length === 0) return null;
  return (
    <table className="region-table" data-testid="region-numeric">
      <caption className="ecdf-key">
        Each plot: share of rows at or below each value.{" "}
        <svg width={18} height={6} aria-hidden="true"><line x1={0} y1={3} x2={18} y2={3} stroke={insideStroke} strokeWidth={1.6} /></svg> region{" "}
        <svg width={18} height={6} aria-hidden="true"><line x1={0} y1={3} x2={18} y2={3} stroke={outsideStroke} strokeWidth={1.2} strokeDasharray="3 2" /></svg> {otherName}
      </caption>
      <thead>
        <tr>
          <th scope="col">column</th>
          <th scope="col" title={`Share of rows at or below each value: the region solid, ${otherName} dashed`}>distribution</th>
          <th scope="col" title="Largest vertical gap between the two curves (two-sample Kolmogorov–Smirnov D, 0 to 1); the table is sorted by it">gap D</th>
          <th scope="col" title={`Difference of the means in pooled standard deviations, region minus ${otherName} (Cohen's d; J. Cohen, Statistical Power Analysis for the Behavioral Sciences, 2nd ed., 1988)`}>{versusLabel}</th>
          <th scope="col" title={`Kolmogorov–Smirnov p-value after the Benjamini–Hochberg adjustment over all columns tested (J. R. Stat. Soc. B 57:289, 1995). ${ksPChoices}`}>adjusted p</th>
        </tr>
      </thead>
      <tbody>
        {lines.map((line) => {
          const curve = curves.find((c) => c.column === line.column);
          return (
            <Fragment key={line.column}>
              <tr className="region-line">
                <th scope="row">{line.column}</th>
                <td>{curve && <EcdfPlot column={line.column} inside={curve.inside} outside={curve.outside} otherName={otherName} />}</td>
                <td className="strong">{formatNumber(line.statistic)}</td>
                <td>{formatNumber(line.d)}</td>
                <td>{formatP(line.pAdjusted)}</td>
              </tr>
              <tr className="region-detail">
                <td colSpan={5}>
                  rows {formatCount(line.nInside)} vs {formatCount(line.nOutside)} · mean {formatNumber(line.meanInside)} vs {formatNumber(line.meanOutside)} · median{" "}
                  {formatNumber(line.medianInside)} vs {formatNumber(line.medianOutside)} · p {formatP(line.p)}
                </td>
              </tr>
            </Fragment>
          );
        })}
      </tbody>
    </table>
  );
}
