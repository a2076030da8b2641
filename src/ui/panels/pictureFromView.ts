import { legendWidth } from "../../core/picture/legendSvg.ts";
import type { PictureInput } from "../../core/picture/pictureTypes.ts";
import { selectRegionOutlines } from "../../state/regionSelectors.ts";
import { selectNodeFill } from "../../state/selectors.ts";
import type { WorkbenchState } from "../../state/store.ts";
import type { Layout } from "../graph/useForceLayout.ts";

const captionRoom = 110; // px under the graph for the caption: about five lines (our choice)

/**
 * The picture of the graph as it is on screen: the layout's places and the edges it draws, the
 * node fill and region outlines of the store, and the build's facts for the caption; the graph part
 * keeps the canvas's size (at least 480 × 320 in all). Null when nothing is built.
 */
export function pictureFromView(state: WorkbenchState, layout: Layout, canvas: { readonly width: number; readonly height: number }, greyscale: boolean): PictureInput | null {
  const { result, source, table } = state;
  if (!result || !source) return null;
  const fill = selectNodeFill(state);
  const outlines = selectRegionOutlines(state).map((outline) => ({ name: state.regions.find((r) => r.id === outline.id)?.name ?? `region ${outline.style + 1}`, nodes: outline.nodes }));
  const { params } = result;
  const isColumn = table?.columns.some((c) => c.name === state.colorBy) ?? false;
  return {
    width: Math.max(480, Math.round(canvas.width) + legendWidth),
    height: Math.max(320, Math.round(canvas.height) + captionRoom),
    x: layout.nodes.map((n) => n.x),
    y: layout.nodes.map((n) => n.y),
    radius: layout.nodes.map((n) => n.radius),
    edges: {
      source: layout.links.map((l) => l.source.index),
      target: layout.links.map((l) => l.target.index),
      shared: layout.links.map((l) => l.shared),
    },
    fill,
    outlines,
    greyscale,
    facts: {
      fileName: source.fileName,
      features: [...params.features, ...(params.oneHot ?? []).map((name) => `${name} (one-hot)`)],
      scale: params.scale, metric: params.metric, radius: params.radius, landmarks: params.landmarks, seed: params.seed,
      nodeCount: result.landmarks.length, edgeCount: result.edges.source.length,
      colourBy: fill ? (isColumn ? state.colorBy : fill.caption) : null,
    },
  };
}

/**
 * An SVG drawn into a canvas at `density` device pixels per picture pixel and encoded as PNG by the
 * browser. The SVG goes in as a data: URL (the page's content security policy allows img-src data:, not blob:).
 */
export async function svgToPng(svg: string, width: number, height: number, density: number): Promise<Uint8Array> {
  const image = new Image();
  image.src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(svg)}`;
  await image.decode();
  const canvas = document.createElement("canvas");
  canvas.width = width * density;
  canvas.height = height * density;
  const context = canvas.getContext("2d");
  if (!context) throw new Error("no 2d canvas to draw the picture on");
  context.drawImage(image, 0, 0, canvas.width, canvas.height);
  const blob = await new Promise<Blob | null>((resolve) => canvas.toBlob(resolve, "image/png"));
  if (!blob) throw new Error("the browser could not encode the picture as PNG");
  return new Uint8Array(await blob.arrayBuffer());
}
