import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { useCommittedNumber } from "./useCommittedNumber.ts";

const steps = 400; // slider positions on the log scale
const span = 20; // the slider reaches from suggested / 20 to suggested · 20

/**
 * Radius as a log-scaled slider around the suggested radius (its units depend on the metric
 * and scaling) plus a number field that accepts any positive value.
 */
export function RadiusControl() {
  const radius = useWorkbench((s) => s.radius);
  const suggested = useWorkbench((s) => s.suggestedRadius);
  const field = useCommittedNumber(radius, (value) => value > 0 && Number.isFinite(value), (value) => void actions().setRadius(value));
  const centre = suggested > 0 ? suggested : radius > 0 ? radius : 1;
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
        {...field}
      />
      <button type="button" onClick={() => void actions().suggestRadius()} title="Radius at which about 1.5·√n landmarks cover the rows (at least min(30, n/5), at most 150); see the README">
        Suggest
      </button>
    </div>
  );
}
