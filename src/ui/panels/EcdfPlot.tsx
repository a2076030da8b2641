import { ecdfPath } from "./ecdfPath.ts";

const width = 84;
const height = 28;
export const insideStroke = "#0072B2"; // Okabe–Ito blue (M. Okabe and K. Ito, 2008): the region, solid
export const outsideStroke = "#5b6270"; // the page's muted ink: the other side, dashed, so the two differ without colour

/** Two empirical CDFs on one axis, the region's solid and the other side's dashed; the axis runs from the smaller minimum to the larger maximum. */
export function EcdfPlot({ column, inside, outside, otherName }: { column: string; inside: Float64Array; outside: Float64Array; otherName: string }) {
  const lo = Math.min(inside[0] ?? Infinity, outside[0] ?? Infinity);
  const hi = Math.max(inside[inside.length - 1] ?? -Infinity, outside[outside.length - 1] ?? -Infinity);
  return (
    <svg className="ecdf-plot" width={width} height={height} viewBox={`-1 -1 ${width + 2} ${height + 2}`} role="img" aria-label={`share of rows at or below each value of ${column}: region solid, ${otherName} dashed`}>
      <rect x={0} y={0} width={width} height={height} className="ecdf-frame" />
      <path d={ecdfPath(outside, lo, hi, width, height)} fill="none" stroke={outsideStroke} strokeWidth={1.2} strokeDasharray="3 2" />
      <path d={ecdfPath(inside, lo, hi, width, height)} fill="none" stroke={insideStroke} strokeWidth={1.6} />
    </svg>
  );
}
