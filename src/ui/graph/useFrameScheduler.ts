import { useMemo, useRef } from "react";

/**
 * Coalesces redraw requests: `request()` asks for one call of `draw` in the next animation frame,
 * however many times it is called before then, so the canvas is drawn at most once a frame and
 * only when something changed. Without requestAnimationFrame (a test DOM) it draws at once.
 */
export function useFrameScheduler(draw: () => void): () => void {
  const latest = useRef(draw);
  latest.current = draw;
  const pending = useRef(false);
  return useMemo(
    () => () => {
      if (typeof requestAnimationFrame === "undefined") return latest.current();
      if (pending.current) return;
      pending.current = true;
      requestAnimationFrame(() => {
        pending.current = false;
        latest.current();
      });
    },
    [],
  );
}
