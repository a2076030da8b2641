import { useState } from "react";
import { useShallow } from "zustand/react/shallow";
import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";

const parseEnd = (text: string): number | null | undefined => {
  if (text.trim() === "") return null; // the default range rule
  const value = Number(text);
  return value > 0 && Number.isFinite(value) ? value : undefined;
};

/** Sweep range (empty ends follow the default rule) and step count; seed count for the seed rebuilds. */
export function SweepSettings() {
  const { sweepMin, sweepMax, sweepSteps, seedCount } = useWorkbench(
    useShallow((s) => ({ sweepMin: s.sweepMin, sweepMax: s.sweepMax, sweepSteps: s.sweepSteps, seedCount: s.seedCount })),
  );
  const [min, setMin] = useState(sweepMin === null ? "" : String(sweepMin));
  const [max, setMax] = useState(sweepMax === null ? "" : String(sweepMax));
  const commit = (nextMin = min, nextMax = max, steps = sweepSteps): void => {
    const lo = parseEnd(nextMin);
    const hi = parseEnd(nextMax);
    if (lo === undefined || hi === undefined || !(Number.isInteger(steps) && steps >= 2 && steps <= 200)) return;
    actions().setSweepRange(lo, hi, steps);
  };
  return (
    <fieldset className="sweep-settings">
      <legend>Stability</legend>
      <label>
        Smallest radius
        <input type="number" min={0} step="any" placeholder="from the data" value={min} onChange={(e) => setMin(e.currentTarget.value)} onBlur={() => commit()} />
      </label>
      <label>
        Largest radius
        <input type="number" min={0} step="any" placeholder="from the data" value={max} onChange={(e) => setMax(e.currentTarget.value)} onBlur={() => commit()} />
      </label>
      <label>
        Steps (log-spaced)
        <input type="number" min={2} max={200} step={1} value={sweepSteps} onChange={(e) => commit(min, max, Number(e.currentTarget.value))} />
      </label>
      <label>
        Seeds
        <input type="number" min={2} max={100} step={1} value={seedCount} onChange={(e) => {
          const k = Number(e.currentTarget.value);
          if (Number.isInteger(k) && k >= 2 && k <= 100) actions().setSeedCount(k);
        }} />
      </label>
    </fieldset>
  );
}
