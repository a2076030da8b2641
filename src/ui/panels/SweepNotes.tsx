import type { RadiusSweep } from "../../core/index.ts";

/** Sentence case and a closing period for a rule text that comes from the engine as a lowercase clause. */
function asSentence(rule: string): string {
  const text = rule.trim();
  if (text === "") return text;
  return `${text[0]!.toUpperCase()}${text.slice(1)}${/[.!?]$/.test(text) ? "" : "."}`;
}

/** How to read the sweep chart: one line each for the shading, the plateau middle's rule, the range rule and region match. */
export function SweepNotes({ sweep, hasRegion }: { sweep: RadiusSweep; hasRegion: boolean }) {
  return (
    <ul className="sweep-notes note" aria-label="how to read the sweep">
      <li>Shaded: plateaus, runs of radii over which the components (b0) and loops (b1) do not change; the darkest holds the plateau middle.</li>
      <li>Solid line: the current radius. Dashed line: the plateau middle.</li>
      <li data-testid="plateau-rule">Plateau middle: {asSentence(sweep.suggestionRule)}</li>
      {sweep.range.rule && <li data-testid="range-rule">Swept range: {asSentence(sweep.range.rule)}</li>}
      <li>Nodes per row: the average number of nodes a row belongs to (nodes overlap). Largest node, largest component: their share of the rows.</li>
      {hasRegion && (
        <li>Region match: the Jaccard index of the region's rows and the best-matching connected node set, shared rows over rows in either (1 = the same rows).</li>
      )}
    </ul>
  );
}
