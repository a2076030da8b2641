import { scaleLinear, scaleLog } from "d3-scale";
import type { RadiusSweep, RegionTrack } from "../../core/index.ts";
import { formatNumber } from "../format.ts";
import { CurrentRadiusMark, currentRadiusText } from "./CurrentRadiusMark.tsx";

const width = 340;
const panelHeight = 46;
const left = 104;
const right = 8;
const top = 16; // band for the current radius's label above the strips

interface Series {
  readonly label: string;
  readonly values: ArrayLike<number>;
  readonly share?: boolean; // 0..1 axis
}

/**
 * Small multiples over one log radius axis (d3-scale, SVG): one strip per figure, plateaus of
 * unchanged b0 and b1 over two or more radii shaded (the plateau middle's darker), the plateau
 * middle dashed, and the current radius always marked (on the near edge, with an arrow, when it
 * lies outside the swept radii).
 * Clicking a strip picks the nearest swept radius.
 */
export function SweepChart({ sweep, region, radius, onPick }: { sweep: RadiusSweep; region: RegionTrack | null; radius: number; onPick: (radius: number) => void }) {
  const f = sweep.figures;
  const series: Series[] = [
    { label: "nodes", values: f.nodes },
    { label: "edges", values: f.edges },
    { label: "components (b0)", values: f.b0 },
    { label: "loops (b1)", values: f.b1 },
    { label: "cycle rank", values: f.cycleRank },
    { label: "nodes per row", values: f.ballsPerRow },
    { label: "largest node", values: f.largestNodeShare, share: true },
    { label: "largest component", values: f.largestComponentShare, share: true },
    ...(region ? [{ label: "region match", values: region.jaccard, share: true }] : []),
  ];
  const radii = f.radius;
  const x = scaleLog().domain([radii[0]!, radii[radii.length - 1]!]).range([left, width - right]);
  const bottom = top + series.length * panelHeight;
  const height = bottom + 18;
  const nearest = (px: number): number => {
    let best = 0;
    for (let k = 1; k < radii.length; ++k) if (Math.abs(x(radii[k]!) - px) < Math.abs(x(radii[best]!) - px)) best = k;
    return radii[best]!;
  };
  const middle = sweep.suggestion?.radius;
  return (
    <svg
      className="sweep-chart"
      viewBox={`0 0 ${width} ${height}`}
      role="img"
      aria-label={`radius sweep from ${formatNumber(radii[0]!)} to ${formatNumber(radii[radii.length - 1]!)}; ${currentRadiusText(radius, radii)}; use the radius list below to rebuild at a swept radius`}
      onClick={(event) => {
        const box = event.currentTarget.getBoundingClientRect();
        onPick(nearest(((event.clientX - box.left) / box.width) * width));
      }}
    >
      {sweep.plateaus.filter((p) => p.last > p.first).map((p, k) => (
        <rect
          key={`${p.first}`}
          className={sweep.suggestion?.plateau.first === p.first ? "plateau middle" : k % 2 ? "plateau odd" : "plateau"}
          x={x(Math.max(p.radiusLow, radii[0]!))}
          width={Math.max(1, x(Math.min(p.radiusHigh, radii[radii.length - 1]!)) - x(Math.max(p.radiusLow, radii[0]!)))}
          y={top}
          height={bottom - top}
        >
          <title>{`components (b0) = ${p.b0}, loops (b1) = ${p.b1} for r in [${formatNumber(p.radiusLow)}, ${formatNumber(p.radiusHigh)}]`}</title>
        </rect>
      ))}
      {series.map((s, row) => {
        let hi = 0;
        for (let k = 0; k < s.values.length; ++k) hi = Math.max(hi, s.values[k]!);
        const y = scaleLinear().domain([0, s.share ? 1 : Math.max(1, hi)]).range([top + row * panelHeight + panelHeight - 6, top + row * panelHeight + 8]);
        const path = Array.from(radii, (r, k) => `${k ? "L" : "M"}${x(r).toFixed(1)},${y(s.values[k]!).toFixed(1)}`).join("");
        return (
          <g key={s.label}>
            <text className="strip-label" x={4} y={top + row * panelHeight + panelHeight / 2 + 4}>{s.label}</text>
            <text className="strip-max" x={left - 4} y={top + row * panelHeight + 14} textAnchor="end">{s.share ? "1" : formatNumber(hi)}</text>
            <line className="strip-base" x1={left} x2={width - right} y1={y(0)} y2={y(0)} />
            <path className="strip-line" d={path} />
          </g>
        );
      })}
      {middle !== undefined && <line className="plateau-middle" x1={x(middle)} x2={x(middle)} y1={top} y2={bottom} />}
      <CurrentRadiusMark radius={radius} radii={radii} x={x} left={left} right={width - right} top={top} bottom={bottom} />
      <text className="axis" x={left} y={height - 4}>{formatNumber(radii[0]!)}</text>
      <text className="axis" x={width - right} y={height - 4} textAnchor="end">{formatNumber(radii[radii.length - 1]!)}</text>
      <text className="axis" x={(left + width) / 2} y={height - 4} textAnchor="middle">radius (log scale)</text>
    </svg>
  );
}
