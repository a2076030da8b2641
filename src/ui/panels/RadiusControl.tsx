import { useEffect, useState } from "react";
import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";

const steps = 400; // slider positions on the log scale
const span = 20; // the slider reaches from suggested / 20 to suggested · 20

/**
 * Radius as a log-scaled slider around the suggested radius (its units depend on the metric
 * and scaling) plus a number field that accepts any positive value.
 */
export function RadiusControl() {
  const radius = useWorkbench((s) => s.radius);
  const suggested = useWorkbench((s) => s.suggestedRadius);
  const [text, setText] = useState("");
  useEffect(() => setText(Number.isNaN(radius) ? "" : String(radius)), [radius]);
  const centre = suggested > 0 ? suggested : radius > 0 ? radius : 1;
  const lo = Math.log(centre / span);
  const hi = Math.log(centre * span);
  const position = Number.isNaN(radius) ? steps / 2 : Math.round(((Math.log(radius) - lo) / (hi - lo)) * steps);
  const commit = (): void => {
    const value = Number(text);
    if (value === radius) return; // Enter then blur would otherwise rebuild twice
    if (text.trim() !== "" && value > 0 && Number.isFinite(value)) void actions().setRadius(value);
    else setText(Number.isNaN(radius) ? "" : String(radius));
  };
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
        value={text}
        onChange={(e) => setText(e.currentTarget.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === "Enter") commit();
        }}
      />
      <button type="button" onClick={() => void actions().suggestRadius()} title="Radius at which about 1.5·√n landmarks cover the rows (at least min(30, n/5), at most 150); see the README">
        Suggest
      </button>
    </div>
  );
}
