import { escapeXml } from "../export/escapeXml.ts";
import { cieLightness } from "./cieLightness.ts";
import { ink, nodeRim, levelColor, levelGrey, missingColor, outlineGap, outlineStyle, plainColor } from "./colourSchemes.ts";
import type { FrameTransform } from "./fitFrame.ts";
import { nodeColorScale } from "./nodeColorScale.ts";
import type { PictureInput } from "./pictureTypes.ts";
import { svgNumber as f } from "./svgNumber.ts";

/** One node's look: fill, whether it is drawn as "no value" (dashed ring in greyscale), and the level number written on it. */
interface NodeLook {
  readonly fill: string;
  readonly dashed: boolean;
  readonly label: string | null;
}

/** The fill of every node, as the workbench colours it; in greyscale, categories become numbered grey steps. */
export function nodeLooks(input: Pick<PictureInput, "fill" | "greyscale">, n: number): NodeLook[] {
  const { fill, greyscale } = input;
  if (!fill) return Array.from({ length: n }, () => ({ fill: plainColor, dashed: false, label: null }));
  if (fill.kind === "categorical") {
    return Array.from({ length: n }, (_, k) => {
      const level = fill.level[k] ?? -1;
      if (!greyscale) return { fill: levelColor(level), dashed: false, label: null };
      return { fill: levelGrey(level), dashed: level < 0, label: level < 0 ? null : String(level + 1) };
    });
  }
  const scale = nodeColorScale(fill.values);
  return Array.from({ length: n }, (_, k) => {
    const value = fill.values[k];
    if (value === undefined || Number.isNaN(value) || !scale) return { fill: greyscale ? "#ffffff" : missingColor, dashed: greyscale, label: null };
    return { fill: scale(value), dashed: false, label: null };
  });
}

/**
 * The graph as SVG elements in picture pixels: edges as lines (width 0.6 + min(8, round(log2 shared)) px,
 * as the workbench), nodes as circles, level numbers in greyscale, and each region's outline as rings
 * `outlineGap` px outside its nodes, in the region's colour and dash.
 */
export function graphSvg(input: PictureInput, frame: FrameTransform): string[] {
  const n = input.x.length;
  const px = (i: number): string => f(frame.k * input.x[i]! + frame.x);
  const py = (i: number): string => f(frame.k * input.y[i]! + frame.y);
  const pr = (i: number): number => frame.k * input.radius[i]!;
  const out: string[] = ['<g class="edges" stroke="#46505f" stroke-opacity="0.45" stroke-linecap="round">'];
  const { source, target, shared } = input.edges;
  for (let e = 0; e < source.length; ++e) {
    const width = 0.6 + Math.min(8, Math.round(Math.log2(shared[e]!)));
    const s = source[e]!, t = target[e]!;
    out.push(`<line x1="${px(s)}" y1="${py(s)}" x2="${px(t)}" y2="${py(t)}" stroke-width="${f(width)}"/>`);
  }
  out.push("</g>", `<g class="nodes" stroke="${nodeRim}" stroke-width="1">`);
  const looks = nodeLooks(input, n);
  for (let i = 0; i < n; ++i) {
    const look = looks[i]!;
    const ring = look.dashed ? ` stroke="${ink}" stroke-dasharray="2 2"` : "";
    out.push(`<circle class="node" data-node="${i + 1}" cx="${px(i)}" cy="${py(i)}" r="${f(pr(i))}" fill="${look.fill}"${ring}/>`);
  }
  out.push("</g>");
  if (looks.some((l) => l.label !== null)) {
    out.push('<g class="level-numbers" text-anchor="middle" font-family="DejaVu Sans, sans-serif">');
    for (let i = 0; i < n; ++i) {
      const { label, fill } = looks[i]!;
      if (label === null) continue;
      const size = Math.min(14, Math.max(7, pr(i)));
      const colour = cieLightness(fill) < 55 ? "#ffffff" : ink; // the side of the middle grey the fill lies on
      out.push(`<text x="${px(i)}" y="${f(frame.k * input.y[i]! + frame.y + size * 0.35)}" font-size="${f(size)}" fill="${colour}">${escapeXml(label)}</text>`);
    }
    out.push("</g>");
  }
  for (const [style, outline] of input.outlines.entries()) {
    const { colour, dash } = outlineStyle(style, input.greyscale);
    const gap = outlineGap(style);
    const rings = outline.nodes.filter((i) => i < n).map((i) => {
      const r = f(pr(i) + gap);
      return `M${f(frame.k * input.x[i]! + frame.x + pr(i) + gap)} ${py(i)}a${r} ${r} 0 1 0 -${f(2 * (pr(i) + gap))} 0a${r} ${r} 0 1 0 ${f(2 * (pr(i) + gap))} 0`;
    });
    if (rings.length === 0) continue;
    const dashes = dash.length > 0 ? ` stroke-dasharray="${dash.join(" ")}"` : "";
    out.push(`<path class="region" data-region="${escapeXml(outline.name)}" fill="none" stroke="${colour}" stroke-width="2"${dashes} d="${rings.join("")}"/>`);
  }
  return out;
}
