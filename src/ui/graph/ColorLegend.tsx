import { actions } from "../../state/actions.ts";
import { selectNodeColorValues } from "../../state/selectors.ts";
import { formatNumber } from "../format.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { colorSchemeName, missingColor, nodeColorScale } from "./scales.ts";

const stops = 9; // gradient stops drawn from the scale

/** Chooses the colour column and shows the scale with its domain (node means, not row values). */
export function ColorLegend() {
  const table = useWorkbench((s) => s.table);
  const colorBy = useWorkbench((s) => s.colorBy);
  const values = useWorkbench(selectNodeColorValues);
  const scale = values ? nodeColorScale(values) : null;
  if (!table) return null;
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
          {table.columns.filter((c) => c.kind === "numeric").map((c) => <option key={c.name} value={c.name}>{c.name}</option>)}
        </select>
      </label>
      {scale && (
        <div className="legend-scale" title={`Colour scheme: ${colorSchemeName}`}>
          <span data-testid="legend-min">{formatNumber(scale.domain()[0]!)}</span>
          <span className="legend-bar" style={{ background: gradient }} aria-hidden="true" />
          <span data-testid="legend-max">{formatNumber(scale.domain()[1]!)}</span>
          <span className="legend-caption">node mean of {colorBy}</span>
          <span className="legend-missing"><i style={{ background: missingColor }} /> no value</span>
        </div>
      )}
    </div>
  );
}
