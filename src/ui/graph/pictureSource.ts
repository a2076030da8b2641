import type { Layout } from "./useForceLayout.ts";

/** What "Save picture" reads of the graph on screen: the layout the canvas draws (null before the first layout) and the canvas, for its size. */
export interface PictureSource {
  readonly layout: () => Layout | null;
  readonly canvas: () => HTMLCanvasElement | null;
}

let current: PictureSource | null = null;

/** Called by the graph view when it mounts; returns the function that takes the source away again (for an effect's cleanup). */
export function registerPictureSource(source: PictureSource): () => void {
  current = source;
  return () => {
    if (current === source) current = null;
  };
}

/** The graph view's positions and canvas now, or null when no graph is drawn. */
export function currentPictureSource(): PictureSource | null {
  return current;
}
