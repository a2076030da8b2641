import { randomSource } from "../random.ts";

/** Columns of the demo table, in file order. */
export const pumpFleetColumns = [
  "pump_id", "district", "family", "age_years", "flow_m3h", "head_m", "power_kw", "efficiency_pct",
  "vibration_mm_s", "bearing_temp_c", "starts_per_day", "runtime_h_per_day", "suction_pressure_kpa",
  "failed_within_90d", "downtime_h",
] as const;

/** The ten numeric columns the demo graph is built over: age_years … suction_pressure_kpa (no outcomes). */
export const pumpFleetFeatures: readonly string[] = pumpFleetColumns.slice(3, 13);

export const pumpFleetSeed = 1;
export const pumpFleetSize = 2400;
export const pumpFamilies = ["borehole", "booster", "lift"] as const;
/** Invented place names; no real town is meant. */
export const pumpDistricts = ["Brackenspur", "Heronmarsh", "Lindenfold", "Otterglen", "Saltfern", "Willowreach"] as const;

type Family = (typeof pumpFamilies)[number];
interface Shift { flow: number; head: number; efficiency: number; vibration: number; bearing: number; suction: number }

// Every number below is invented for this scenario and tuned so that the graph at the default radius
// shows the designed shape (see generatePumpFleet); plausible units, no real fleet behind them.
const loopShare = 0.2; // pumps in the duty rotation
const flareShare = 0.2; // pumps on the suction flare
const core = { flow: 60, head: 35, efficiency: 62, vibration: 1.8, bearing: 38, suction: 190, age: 18 };
// Branch tips (s = 1): flow and head are the tip's values, the rest are shifts from the core.
const tips: Record<Family, Shift> = {
  borehole: { flow: 40, head: 190, efficiency: 10, vibration: 1, bearing: 14, suction: -30 },
  booster: { flow: 260, head: 70, efficiency: 18, vibration: 0.5, bearing: 8, suction: 100 },
  lift: { flow: 650, head: 12, efficiency: -10, vibration: 3, bearing: 4, suction: -10 },
};
const tipAgeDrop = 12; // specialised units are the newer ones
// Duty: branch pumps move from the core's frequent short runs to the tips' 8 starts and 12 h a day;
// rotation pumps go round the ellipse starts = 8 − 4.5 sin θ, runtime = 17 − 5 cos θ, which meets
// the booster tip at θ = 0 and has the branches on its outside, so nothing fills the hole.
const duty = { tipStarts: 8, tipRuntime: 12, coreExtraStarts: 8, coreRuntimeCut: 10, startsSwing: 4.5, runtimeSwing: 5 };
const flare = { suction: 150, vibration: 7.5, bearing: 26, efficiency: 8, age: 5 }; // change at the far end, u = 1
const noise = { flow: 0.01, head: 0.01, efficiency: 0.4, age: 0.5, vibration: 0.05, bearing: 0.4, starts: 0.15, runtime: 0.1, suction: 2 };
const failureBase = 0.035; // 90-day failure chance away from the flare
const failurePeak = 0.8; // at the flare's far end; rises as u²
const bearingMissingShare = 0.02;

export interface PumpFleetOptions {
  seed?: number;
  pumps?: number;
}

/**
 * Invented demo table: a water utility's pump fleet, one row per pump, as CSV text (header,
 * then one record per pump, "\n" line endings, trailing newline). Its shape is designed:
 * - three branches from a shared core: each family moves from the standard small unit (s = 0)
 *   towards its own flow/head/efficiency corner as its progress s ∈ [0, 1] grows;
 * - a loop: booster pumps in a duty rotation, whose starts and runtime per day go round an ellipse
 *   with the rotation phase θ, hanging from the booster tip;
 * - a flare from the core: suction pressure falls with u ∈ [0, 1] while vibration, bearing
 *   temperature and the 90-day failure chance rise (3.5% elsewhere, 80% at u = 1).
 * About 2% of bearing temperatures are missing (empty cells).
 * Power is shaft power P = ρ·g·Q·H / η, in kW = Q[m³/h]·H[m] / (367·η) for water.
 * Normal draws: Box–Muller transform (G. E. P. Box and M. E. Muller, Ann. Math. Statist.
 * 29(2):610–611, 1958) over randomSource. Deterministic: one seed gives the same bytes. O(pumps).
 * @example generatePumpFleet().split("\n")[1] // => "P-00001,Heronmarsh,booster,6.1,254.6,69.3,60.32,79.7,2.19,46.7,8.4,22.1,289.3,0,2.5"
 */
export function generatePumpFleet(options: PumpFleetOptions = {}): string {
  const { seed = pumpFleetSeed, pumps = pumpFleetSize } = options;
  if (!Number.isInteger(pumps) || pumps < 1) throw new Error(`invalid pump count: ${pumps}`);
  const random = randomSource(seed);
  const normal = (): number => Math.sqrt(-2 * Math.log(1 - random())) * Math.cos(2 * Math.PI * random());
  const lines: string[] = [pumpFleetColumns.join(",")];
  for (let i = 0; i < pumps; ++i) {
    const part = random();
    const isLoop = part < loopShare;
    const isFlare = !isLoop && part < loopShare + flareShare;
    const family: Family = isLoop ? "booster" : pumpFamilies[Math.floor(random() * pumpFamilies.length)]!;
    const s = isLoop ? 1 : isFlare ? 0 : random();
    const theta = isLoop ? 2 * Math.PI * random() : 0;
    const u = isFlare ? random() : 0;
    const tip = tips[family];
    const flow = lerp(core.flow, tip.flow, s) * Math.exp(noise.flow * normal());
    const head = lerp(core.head, tip.head, s) * Math.exp(noise.head * normal());
    const efficiency = core.efficiency + tip.efficiency * s - flare.efficiency * u + noise.efficiency * normal();
    const power = (flow * head) / (3.67 * efficiency); // 367 = 3600 s/h · 1000 W/kW / (1000 kg/m³ · 9.81 m/s²), η in %
    const age = core.age - tipAgeDrop * s + flare.age * u + noise.age * normal();
    const vibration = core.vibration + tip.vibration * s + flare.vibration * u ** 1.2 + noise.vibration * normal();
    const bearing = core.bearing + tip.bearing * s + flare.bearing * u + noise.bearing * normal();
    const starts = duty.tipStarts + duty.coreExtraStarts * (1 - s) - duty.startsSwing * Math.sin(theta) + noise.starts * normal();
    const runtime = duty.tipRuntime - duty.coreRuntimeCut * (1 - s) + duty.runtimeSwing * (1 - Math.cos(theta)) + noise.runtime * normal();
    const suction = core.suction + tip.suction * s - flare.suction * u + noise.suction * normal();
    const failed = random() < failureBase + (failurePeak - failureBase) * u * u;
    // repair hours when failed; otherwise most pumps had no stop and some a short planned one
    const downtime = failed ? 8 + 90 * (0.5 + u) * random() : random() < 0.3 ? 4 * random() : 0;
    const district = pumpDistricts[Math.floor(random() * pumpDistricts.length)]!;
    const bearingMissing = random() < bearingMissingShare;
    lines.push([
      `P-${String(i + 1).padStart(5, "0")}`, district, family,
      age.toFixed(1), flow.toFixed(1), head.toFixed(1), power.toFixed(2), efficiency.toFixed(1),
      vibration.toFixed(2), bearingMissing ? "" : bearing.toFixed(1),
      starts.toFixed(1), runtime.toFixed(1), suction.toFixed(1),
      failed ? "1" : "0", downtime.toFixed(1),
    ].join(","));
  }
  return lines.join("\n") + "\n";
}

function lerp(a: number, b: number, t: number): number {
  return a + (b - a) * t;
}
