import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { radiusUnits } from "./radiusUnits.ts";
import { useCommittedNumber } from "./useCommittedNumber.ts";

const steps = 400; // slider positions on the log scale
const span = 20; // the slider reaches from the default radius / 20 to the default radius · 20

/**
 * Radius as a log-scaled slider around the default radius (its units depend on the metric
 * and scaling, said in one line below) plus a number field that accepts any positive value.
 */
export function RadiusControl() {
  const radius = useWorkbench((s) => s.radius);
  const defaultRadius = useWorkbench((s) => s.suggestedRadius);
  const units = useWorkbench((s) => radiusUnits(s.metric, s.scale));
  const field = useCommittedNumber(radius, (value) => value > 0 && Number.isFinite(value), (value) => void actions().setRadius(value));
  const centre = defaultRadius > 0 ? defaultRadius : radius > 0 ? radius : 1;
  const lo = Math.log(centre / span);
  const hi = Math.log(centre * span);
  const position = Number.isNaN(radius) ? steps / 2 : Math.round(((Math.log(radius) - lo) / (hi - lo)) * steps);

  return (
    <div className="radius-control">
      <label htmlFor="radius-number">Radius</label>
      <input
        type="range"
        aria-label="radius slider"
        min={0}
        max={steps}
        value={Math.min(steps, Math.max(0, position))}
        onChange={(e) => {
          const value = Math.exp(lo + (Number(e.currentTarget.value) / steps) * (hi - lo));
          void actions().setRadius(Number(value.toPrecision(3)));
        }}
      />
      <input
        id="radius-number"
        type="number"
        min={0}
        step="any"
        aria-describedby="radius-units"
        {...field}
      />
      <button type="button" onClick={() => void actions().suggestRadius()} title="Back to the default radius: the radius at which about 1.5·√n landmarks cover the rows (at least min(30, n/5), at most 150); see the README">
        Default radius
      </button>
      <p id="radius-units" className="note radius-units">{units}</p>
    </div>
  );
}
