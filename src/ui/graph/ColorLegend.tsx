import { actions } from "../../state/actions.ts";
import { levelsColor, regionColor, selectLevelColumns } from "../../state/colorChoices.ts";
import { selectNodeFill, stabilityColor } from "../../state/selectors.ts";
import { formatNumber } from "../format.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { maxDrawnEdges } from "./drawLimits.ts";
import { categoricalSchemeName, colorSchemeName, levelColor, missingColor, nodeColorScale, okabeIto, otherColor } from "./scales.ts";

const stops = 9; // gradient stops drawn from the scale

/** Chooses the colour column (and, for a categorical one, majority or one level's share) and shows the scale with its domain. */
export function ColorLegend() {
  const table = useWorkbench((s) => s.table);
  const colorBy = useWorkbench((s) => s.colorBy);
  const colorLevel = useWorkbench((s) => s.colorLevel);
  const fill = useWorkbench(selectNodeFill);
  const hasStability = useWorkbench((s) => s.seedRuns?.regionShare != null);
  const edgeCount = useWorkbench((s) => s.result?.edges.source.length ?? 0);
  const regions = useWorkbench((s) => s.regions);
  const levelColumns = useWorkbench(selectLevelColumns);
  if (!table) return null;
  const chosen = table.columns.find((c) => c.name === colorBy);
  const chosenLevels = chosen?.categories?.levels ?? levelColumns.find((c) => levelsColor(c.name) === colorBy)?.levels;
  const scale = fill?.kind === "sequential" ? nodeColorScale(fill.values) : null;
  const gradient = scale
    ? `linear-gradient(to right, ${Array.from({ length: stops }, (_, i) => {
        const [lo, hi] = scale.domain() as [number, number];
        return scale(lo + ((hi - lo) * i) / (stops - 1));
      }).join(", ")})`
    : undefined;
  return (
    <div className="legend" data-testid="legend">
      <label>
        Colour by
        <select value={colorBy ?? ""} onChange={(e) => actions().setColorBy(e.currentTarget.value || null)}>
          <option value="">nothing (plain)</option>
          {table.columns.filter((c) => c.kind === "numeric" || c.categories).map((c) => (
            <option key={c.name} value={c.name}>{c.name}{c.kind === "numeric" ? "" : " (category)"}</option>
          ))}
          {levelColumns.map((c) => <option key={`levels-${c.name}`} value={levelsColor(c.name)}>{c.name} (as categories)</option>)}
          {regions.map((r) => <option key={`region-${r.id}`} value={regionColor(r.id)}>share of rows in {r.name}</option>)}
          {hasStability && <option value={stabilityColor}>stability of membership</option>}
        </select>
      </label>
      {chosenLevels && (
        <label>
          showing
          <select value={colorLevel ?? ""} onChange={(e) => actions().setColorLevel(e.currentTarget.value || null)}>
            <option value="">most common level</option>
            {chosenLevels.map((level) => <option key={level} value={level}>share of {level}</option>)}
          </select>
        </label>
      )}
      {scale && fill && (
        <div className="legend-scale" title={`Colour scheme: ${colorSchemeName}`}>
          <span data-testid="legend-min">{formatNumber(scale.domain()[0]!)}</span>
          <span className="legend-bar" style={{ background: gradient }} aria-hidden="true" />
          <span data-testid="legend-max">{formatNumber(scale.domain()[1]!)}</span>
          <span className="legend-caption">{fill.caption}</span>
          <span className="legend-missing"><i style={{ background: missingColor }} /> no value</span>
        </div>
      )}
      {edgeCount > maxDrawnEdges && (
        <span className="legend-caption" data-testid="edges-note">
          drawing the {maxDrawnEdges.toLocaleString("en-US")} edges that share the most rows, of {edgeCount.toLocaleString("en-US")}
        </span>
      )}
      {fill?.kind === "categorical" && (
        <ul className="legend-levels" title={`Colour scheme: ${categoricalSchemeName}`} aria-label={fill.caption}>
          {fill.levels.slice(0, okabeIto.length).map((level, k) => (
            <li key={level}><i style={{ background: levelColor(k) }} /> {level}</li>
          ))}
          {fill.levels.length > okabeIto.length && <li><i style={{ background: otherColor }} /> {fill.levels.length - okabeIto.length} more levels</li>}
        </ul>
      )}
    </div>
  );
}
