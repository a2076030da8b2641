import { useState } from "react";
import { useShallow } from "zustand/react/shallow";
import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { SettingField } from "./SettingField.tsx";

const endError = "ignored: enter a positive number, or leave empty for the range from the data";
const parseEnd = (text: string): number | null | undefined => {
  if (text.trim() === "") return null; // the default range rule
  const value = Number(text);
  return value > 0 && Number.isFinite(value) ? value : undefined;
};
const wholeIn = (text: string, lo: number, hi: number): number | undefined => {
  const value = Number(text);
  return text.trim() !== "" && Number.isInteger(value) && value >= lo && value <= hi ? value : undefined;
};

/**
 * Sweep range (empty ends follow the default rule) and step count; seed count for the seed rebuilds.
 * An invalid value is not applied, stays in its field, and is explained beside it.
 */
export function SweepSettings() {
  const { sweepMin, sweepMax, sweepSteps, seedCount } = useWorkbench(
    useShallow((s) => ({ sweepMin: s.sweepMin, sweepMax: s.sweepMax, sweepSteps: s.sweepSteps, seedCount: s.seedCount })),
  );
  const [min, setMin] = useState(sweepMin === null ? "" : String(sweepMin));
  const [max, setMax] = useState(sweepMax === null ? "" : String(sweepMax));
  const [steps, setSteps] = useState(String(sweepSteps));
  const [seeds, setSeeds] = useState(String(seedCount));
  const lo = parseEnd(min);
  const hi = parseEnd(max);
  const stepCount = wholeIn(steps, 2, 200);
  const inverted = lo != null && hi != null && !(lo < hi);
  const commit = (nextLo = lo, nextHi = hi, nextSteps = stepCount): void => {
    if (nextLo === undefined || nextHi === undefined || nextSteps === undefined) return;
    if (nextLo !== null && nextHi !== null && !(nextLo < nextHi)) return;
    actions().setSweepRange(nextLo, nextHi, nextSteps);
  };
  return (
    <fieldset className="sweep-settings">
      <legend>Stability</legend>
      <SettingField id="sweep-min" label="Smallest radius" min={0} step="any" placeholder="from the data" value={min}
        error={lo === undefined ? endError : null}
        onChange={(e) => setMin(e.currentTarget.value)} onBlur={() => commit()} />
      <SettingField id="sweep-max" label="Largest radius" min={0} step="any" placeholder="from the data" value={max}
        error={hi === undefined ? endError : inverted ? "ignored: must be larger than the smallest radius" : null}
        onChange={(e) => setMax(e.currentTarget.value)} onBlur={() => commit()} />
      <SettingField id="sweep-steps" label="Steps (log-spaced)" min={2} max={200} step={1} value={steps}
        error={stepCount === undefined ? "ignored: enter a whole number from 2 to 200" : null}
        onChange={(e) => {
          const text = e.currentTarget.value;
          setSteps(text);
          commit(lo, hi, wholeIn(text, 2, 200));
        }} />
      <SettingField id="seed-count" label="Seeds" min={2} max={100} step={1} value={seeds}
        error={wholeIn(seeds, 2, 100) === undefined ? "ignored: enter a whole number from 2 to 100" : null}
        onChange={(e) => {
          const text = e.currentTarget.value;
          setSeeds(text);
          const k = wholeIn(text, 2, 100);
          if (k !== undefined) actions().setSeedCount(k);
        }} />
    </fieldset>
  );
}
