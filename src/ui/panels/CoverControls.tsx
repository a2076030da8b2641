import { metricNames, missingPolicies, scaleNames, type LandmarkRule, type MissingPolicy, type ScaleName } from "../../core/index.ts";
import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { RadiusControl } from "./RadiusControl.tsx";
import { SeedField } from "./SeedField.tsx";

const metricLabel: Record<string, string> = {
  euclidean: "Euclidean",
  manhattan: "Manhattan (L1)",
  chebyshev: "Chebyshev (max)",
  cosine: "cosine (1 − cos)",
  correlation: "correlation (1 − r)",
};
const orderLabel: Record<LandmarkRule, string> = { "greedy-file-order": "greedy, file order", "greedy-shuffled": "greedy, seeded shuffle", maximin: "maximin (farthest point)" };
const scaleLabel: Record<ScaleName, string> = { zscore: "z-score", robust: "median / IQR", minmax: "min–max [0, 1]", none: "none (raw units)" };
const scaleNote: Record<ScaleName, string> = {
  zscore: "Each feature: (x − mean) / sample standard deviation (n − 1).",
  robust: "Each feature: (x − median) / interquartile range (type-7 quartiles).",
  minmax: "Each feature: (x − min) / (max − min).",
  none: "Raw values: columns with large units dominate the distance.",
};
const missingLabel: Record<MissingPolicy, string> = { drop: "leave the row out", median: "fill with column median", mean: "fill with column mean" };

/** The recipe of the cover: scaling, metric, radius and how landmarks are picked. */
export function CoverControls() {
  const metric = useWorkbench((s) => s.metric);
  const landmarks = useWorkbench((s) => s.landmarks);
  const scale = useWorkbench((s) => s.scale);
  const missing = useWorkbench((s) => s.missing);
  return (
    <fieldset className="cover-controls">
      <legend>Cover</legend>
      <label>
        Scaling
        <select value={scale} aria-describedby="scale-note" onChange={(e) => void actions().setScale(e.currentTarget.value as ScaleName)}>
          {scaleNames.map((name) => <option key={name} value={name}>{scaleLabel[name]}</option>)}
        </select>
      </label>
      <p id="scale-note" className="note">{scaleNote[scale]}</p>
      <label>
        Missing value
        <select value={missing} onChange={(e) => void actions().setMissing(e.currentTarget.value as MissingPolicy)}>
          {missingPolicies.map((name) => <option key={name} value={name}>{missingLabel[name]}</option>)}
        </select>
      </label>
      <label>
        Metric
        <select value={metric} onChange={(e) => void actions().setMetric(e.currentTarget.value as typeof metric)}>
          {metricNames.map((name) => <option key={name} value={name}>{metricLabel[name] ?? name}</option>)}
        </select>
      </label>
      <RadiusControl />
      <label>
        Landmark order
        <select value={landmarks} aria-describedby="landmark-note" onChange={(e) => void actions().setLandmarks(e.currentTarget.value as LandmarkRule)}>
          {(Object.keys(orderLabel) as LandmarkRule[]).map((rule) => <option key={rule} value={rule}>{orderLabel[rule]}</option>)}
        </select>
      </label>
      <p id="landmark-note" className="note">
        Landmark: a row chosen as a centre; its ball is every row within the radius of it, and every row lies in at least one ball.
      </p>
      <SeedField />
    </fieldset>
  );
}
