import { formatNumber } from "../format.ts";

/** Where the current radius lies against the swept radii (ascending): inside, below the first, or above the last. */
export function currentRadiusPlace(radius: number, radii: ArrayLike<number>): "inside" | "below" | "above" {
  if (radius < radii[0]!) return "below";
  if (radius > radii[radii.length - 1]!) return "above";
  return "inside";
}

/** One sentence for the current radius, also read by screen readers in the chart's label. */
export function currentRadiusText(radius: number, radii: ArrayLike<number>): string {
  const place = currentRadiusPlace(radius, radii);
  return place === "inside" ? `current radius ${formatNumber(radius)}` : `current radius ${formatNumber(radius)} lies ${place} the swept range`;
}

interface MarkProps {
  readonly radius: number;
  readonly radii: ArrayLike<number>;
  /** Screen x of a radius inside the swept range. */
  readonly x: (radius: number) => number;
  readonly left: number;
  readonly right: number;
  readonly top: number;
  readonly bottom: number;
}

/**
 * The current radius on the sweep chart, always: a solid line where it lies among the swept radii,
 * otherwise a line on the near edge and an arrow pointing out of the range with a sentence saying so.
 */
export function CurrentRadiusMark({ radius, radii, x, left, right, top, bottom }: MarkProps) {
  if (!(radius > 0)) return null;
  const place = currentRadiusPlace(radius, radii);
  const text = currentRadiusText(radius, radii);
  if (place === "inside") {
    const at = x(radius);
    const anchor = at < left + 60 ? "start" : at > right - 60 ? "end" : "middle";
    return (
      <g className="current-mark" data-testid="current-radius">
        <line className="current" x1={at} x2={at} y1={top} y2={bottom} />
        <text className="current-label" x={at} y={top - 4} textAnchor={anchor}>{text}</text>
      </g>
    );
  }
  const edge = place === "below" ? left : right;
  // the sentence runs along the top band from the chart's edge on that side; the arrow leads it
  return (
    <g className="current-mark outside" data-testid="current-radius">
      <line className="current" x1={edge} x2={edge} y1={top} y2={bottom} />
      <text className="current-label" x={place === "below" ? 2 : right} y={top - 4} textAnchor={place === "below" ? "start" : "end"}>
        {place === "below" ? `← ${text}` : `${text} →`}
      </text>
    </g>
  );
}
