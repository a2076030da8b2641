import { Fragment } from "react";
import type { HotspotScan } from "../../core/index.ts";
import { actions } from "../../state/actions.ts";
import { formatCount, formatNumber } from "../format.ts";
import { formatP } from "../formatP.ts";

const signed = (x: number): string => (x > 0 ? `+${formatNumber(x)}` : formatNumber(x));

/**
 * The hotspots of one scan, best first: rank, rows, inside vs outside, the difference with its
 * bootstrap interval, p, seed stability when run, and the search; under each line its nodes
 * (1-based). Choosing one keeps it as a region and selects its nodes.
 */
export function HotspotList({ scan }: { scan: HotspotScan }) {
  const seeded = scan.stabilitySeeds > 0;
  return (
    <>
      <div className="hotspot-scroll">
        <table className="hotspot-list" data-testid="hotspot-list">
          <caption>Hotspots of {scan.outcome} ({scan.direction === "both" ? "high or low" : scan.direction}, {scan.score} score)</caption>
          <thead>
            <tr>
              <th scope="col">Rank</th>
              <th scope="col">Rows</th>
              <th scope="col">Inside vs outside</th>
              <th scope="col" aria-describedby="hotspot-interval-note">Difference (95% interval)</th>
              <th scope="col">p</th>
              {seeded && <th scope="col" title="share of the landmark seeds at which a hotspot with Jaccard ≥ 0.5 to it (by rows) is found again with p ≤ 0.05">Seed stability (of {scan.stabilitySeeds})</th>}
              <th scope="col">Region</th>
            </tr>
          </thead>
          <tbody>
            {scan.hotspots.map((h) => (
              <Fragment key={h.rank}>
                <tr data-testid="hotspot">
                  <td>{h.rank}{h.search === "heuristic" && <span className="hotspot-heuristic"> heuristic</span>}</td>
                  <td>{formatCount(h.nInside)}</td>
                  <td>{formatNumber(h.inside)} vs {formatNumber(h.outside)}</td>
                  <td data-testid="hotspot-difference">{signed(h.difference)} ({formatNumber(h.ciLow)} to {formatNumber(h.ciHigh)})</td>
                  <td data-testid="hotspot-p">{formatP(h.p)}</td>
                  {seeded && <td>{h.seedShare === null ? "–" : `${formatNumber(h.seedShare * 100)}%`}</td>}
                  <td>
                    <button type="button" onClick={() => actions().keepHotspot(h.rank)} aria-label={`keep hotspot ${h.rank} as a region`}>Keep</button>
                  </td>
                </tr>
                <tr className="hotspot-nodes">
                  <td colSpan={seeded ? 7 : 6} data-testid="hotspot-nodes">nodes {Array.from(h.nodes, (k) => k + 1).join(" ")}</td>
                </tr>
              </Fragment>
            ))}
          </tbody>
        </table>
      </div>
      <p id="hotspot-interval-note" className="note" data-testid="hotspot-interval-note">
        Each region was chosen because it scored highest, so its interval (percentile bootstrap, rows resampled inside and outside) is optimistic: a fresh sample would likely show a smaller difference.
      </p>
      {scan.hotspots.length > 1 && (
        <p className="note">Hotspots after the first share no node with a better one and are tested against the same distribution of maxima, so their p-values are conservative.</p>
      )}
    </>
  );
}
