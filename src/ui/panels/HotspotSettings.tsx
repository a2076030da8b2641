import { useState } from "react";
import { useShallow } from "zustand/react/shallow";
import type { HotspotDirection, HotspotScore } from "../../core/index.ts";
import { actions } from "../../state/actions.ts";
import type { HotspotSettingsPatch } from "../../state/hotspotActions.ts";
import { selectHotspotColumn, selectHotspotColumns } from "../../state/hotspotSelectors.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { SettingField } from "./SettingField.tsx";

const wholeIn = (text: string, lo: number, hi: number): number | undefined => {
  const value = Number(text);
  return text.trim() !== "" && Number.isInteger(value) && value >= lo && value <= hi ? value : undefined;
};

/** A number field of the scan: a whole number in [lo, hi] is applied as typed; anything else stays in the field, named as ignored. */
function WholeField({ id, label, lo, hi, initial, apply }: { id: string; label: string; lo: number; hi: number; initial: number; apply: (value: number) => HotspotSettingsPatch }) {
  const [text, setText] = useState(String(initial));
  return (
    <SettingField id={id} label={label} min={lo} max={hi} step={1} value={text}
      error={wholeIn(text, lo, hi) === undefined ? `ignored: enter a whole number from ${lo} to ${hi}` : null}
      onChange={(e) => {
        const next = e.currentTarget.value;
        setText(next);
        const value = wholeIn(next, lo, hi);
        if (value !== undefined) void actions().setHotspotSettings(apply(value));
      }} />
  );
}

const fewestReplicates = 19; // the fewest at which p = 1/(R + 1) can reach 0.05 (worked by hand)

/** What the scan looks for: the outcome, the direction, K, replicates, the score, the scan seed and the stability seeds. */
export function HotspotSettings() {
  const columns = useWorkbench(selectHotspotColumns);
  const column = useWorkbench(selectHotspotColumn);
  const s = useWorkbench(useShallow((state) => ({
    direction: state.hotspotDirection, maxNodes: state.hotspotMaxNodes, replicates: state.hotspotReplicates,
    score: state.hotspotScore, scanSeed: state.hotspotScanSeed, stabilitySeeds: state.hotspotStabilitySeeds,
  })));
  return (
    <fieldset className="hotspot-settings">
      <legend>Outcome hotspots</legend>
      <label>
        Outcome scanned
        <select value={column ?? ""} onChange={(e) => void actions().setHotspotSettings({ hotspotColumn: e.currentTarget.value })} disabled={columns.length === 0}>
          {columns.length === 0 && <option value="">no numeric outcome column</option>}
          {columns.map((name) => <option key={name} value={name}>{name}</option>)}
        </select>
      </label>
      <label>
        Direction
        <select value={s.direction} onChange={(e) => void actions().setHotspotSettings({ hotspotDirection: e.currentTarget.value as HotspotDirection })}>
          <option value="high">high values</option>
          <option value="low">low values</option>
          <option value="both">either</option>
        </select>
      </label>
      <label>
        Score
        <select value={s.score} title="auto: Bernoulli for an outcome of 0s and 1s, otherwise normal" onChange={(e) => void actions().setHotspotSettings({ hotspotScore: e.currentTarget.value as HotspotScore | "auto" })}>
          <option value="auto">auto (by the values)</option>
          <option value="bernoulli">Bernoulli</option>
          <option value="normal">normal</option>
          <option value="rank">rank (skewed outcomes)</option>
        </select>
      </label>
      <WholeField id="hotspot-k" label="Nodes per region at most (K)" lo={1} hi={15} initial={s.maxNodes} apply={(v) => ({ hotspotMaxNodes: v })} />
      <WholeField id="hotspot-replicates" label="Replicates" lo={fewestReplicates} hi={99_999} initial={s.replicates} apply={(v) => ({ hotspotReplicates: v })} />
      <WholeField id="hotspot-scan-seed" label="Scan seed" lo={0} hi={2 ** 31 - 1} initial={s.scanSeed} apply={(v) => ({ hotspotScanSeed: v })} />
      <WholeField id="hotspot-stability-seeds" label="Stability seeds (0: skip)" lo={0} hi={100} initial={s.stabilitySeeds} apply={(v) => ({ hotspotStabilitySeeds: v })} />
    </fieldset>
  );
}
