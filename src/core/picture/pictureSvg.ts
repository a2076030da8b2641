import { escapeXml } from "../export/escapeXml.ts";
import { captionLines } from "./captionLines.ts";
import { ink } from "./colourSchemes.ts";
import { fitFrame } from "./fitFrame.ts";
import { graphSvg } from "./graphSvg.ts";
import { legendSvg, legendWidth } from "./legendSvg.ts";
import type { PictureInput } from "./pictureTypes.ts";
import { svgNumber as f } from "./svgNumber.ts";

const captionLine = 18; // px between caption lines at font size 13 (our choice)
const charWidth = 7.2; // px, an average character of 13 px DejaVu Sans (about 0.55 em, from memory): for wrapping the caption
export const minPictureSize = { width: 480, height: 320 }; // below this the legend and caption leave no room for the graph (our choice)

/**
 * A picture of a cover graph as one SVG document (SVG 1.1, UTF-8): the graph fitted into the left
 * part, the legend in a column on the right, the caption under both. All text is real <text>,
 * escaped by `escapeXml`; every coordinate has two decimals (`svgNumber`) and nothing depends on the
 * clock or the locale, so the same input gives the same bytes. Fonts: DejaVu Sans, then the reader's
 * sans-serif. Throws for a size below 480 × 320 or not whole. O(nodes + edges + regions' nodes).
 * @example pictureSvg(input).startsWith('<?xml version="1.0" encoding="UTF-8"?>') // => true
 */
export function pictureSvg(input: PictureInput): string {
  const { width, height } = input;
  if (!Number.isInteger(width) || !Number.isInteger(height) || width < minPictureSize.width || height < minPictureSize.height) {
    throw new Error(`invalid picture size: ${width}x${height} (at least ${minPictureSize.width}x${minPictureSize.height} whole pixels)`);
  }
  const caption = captionLines(input.facts, Math.floor((width - 32) / charWidth));
  const captionTop = height - caption.length * captionLine - 12;
  const graphWidth = width - legendWidth;
  const frame = fitFrame(input.x, input.y, input.radius, { left: 0, top: 0, width: graphWidth, height: captionTop - 8, margin: 28 });
  const title = `Cover graph of ${input.facts.fileName}`;
  return [
    '<?xml version="1.0" encoding="UTF-8"?>',
    `<svg xmlns="http://www.w3.org/2000/svg" version="1.1" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">`,
    `<title>${escapeXml(title)}</title>`,
    `<desc>${escapeXml(captionLines(input.facts, Infinity).join("\n"))}</desc>`,
    `<rect width="${width}" height="${height}" fill="#ffffff"/>`,
    ...graphSvg(input, frame),
    ...legendSvg(input, graphWidth + 8, 24),
    `<line x1="16" y1="${f(captionTop - 4)}" x2="${width - 16}" y2="${f(captionTop - 4)}" stroke="${ink}" stroke-opacity="0.25"/>`,
    `<g class="caption" font-family="DejaVu Sans, sans-serif" font-size="13" fill="${ink}">`,
    ...caption.map((text, k) => {
      const indent = text.startsWith("  ") ? 16 : 0;
      return `<text x="${16 + indent}" y="${f(captionTop + 14 + k * captionLine)}">${escapeXml(text.trimStart())}</text>`;
    }),
    "</g>",
    "</svg>",
    "",
  ].join("\n");
}
