import type { RegionTableLine } from "../../core/index.ts";
import { formatCount, formatNumber } from "../format.ts";
import { formatP } from "../formatP.ts";

type CategoricalLine = Extract<RegionTableLine, { kind: "categorical" }>;

const percent = (share: number): string => (Number.isNaN(share) ? "–" : `${formatNumber(100 * share)}%`);

/** The categorical lines of a region table: each level's share on both sides and Pearson's chi-squared test, flagged when an expected count is below 5. */
export function RegionLevelsView({ lines, otherName }: { lines: readonly CategoricalLine[]; otherName: string }) {
  if (lines.length === 0) return null;
  return (
    <div className="region-levels" data-testid="region-categorical">
      {lines.map((line) => (
        <table key={line.column} className="region-table">
          <caption>
            <strong>{line.column}</strong>: chi-squared {formatNumber(line.statistic)} on {line.degreesOfFreedom} df, p {formatP(line.p)}, adjusted p {formatP(line.pAdjusted)}
            {line.hasSmallExpected && <span className="region-flag"> · some expected counts are below 5, so this p-value is rough</span>}
          </caption>
          <thead>
            <tr>
              <th scope="col">level</th>
              <th scope="col">region ({formatCount(line.nInside)})</th>
              <th scope="col">{otherName} ({formatCount(line.nOutside)})</th>
            </tr>
          </thead>
          <tbody>
            {line.levels.map((level) => (
              <tr key={level.level}>
                <th scope="row">{level.level}</th>
                <td>{percent(level.shareInside)}</td>
                <td>{percent(level.shareOutside)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ))}
    </div>
  );
}
