import { formatNumber } from "../format.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** Spread of the graph over landmark seeds at one radius, and how often row pairs stay together. */
export function SeedSummary() {
  const runs = useWorkbench((s) => s.seedRuns);
  if (!runs) return null;
  const rows = [
    ["nodes", runs.spread.nodes],
    ["edges", runs.spread.edges],
    ["components (b0)", runs.spread.b0],
    ["loops (b1)", runs.spread.b1],
  ] as const;
  return (
    <section className="seed-summary" data-testid="seed-summary">
      <h2>{runs.seeds.length} seeds at radius {formatNumber(runs.radius)}</h2>
      <table>
        <thead><tr><th scope="col">figure</th><th scope="col">min</th><th scope="col">median</th><th scope="col">max</th></tr></thead>
        <tbody>
          {rows.map(([name, spread]) => (
            <tr key={name}><th scope="row">{name}</th><td>{formatNumber(spread.min)}</td><td>{formatNumber(spread.median)}</td><td>{formatNumber(spread.max)}</td></tr>
          ))}
        </tbody>
      </table>
      <p>
        Co-membership agreement: <strong data-testid="agreement">{formatNumber(runs.agreement)}</strong>, the share of row pairs
        sharing a node in one build that share a node in another, averaged over pairs of builds
        {runs.pairs.sampled ? ` (${runs.pairs.perBuild.toLocaleString("en-US")} sampled pairs per build)` : " (all pairs)"}.
      </p>
      {runs.regionShare && <p className="note">Colour by “stability of membership” to see how often each node's rows land in the region.</p>}
    </section>
  );
}
