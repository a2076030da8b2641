import type { CoverResult } from "../../core/index.ts";
import type { LayoutPositions } from "../slices/sessionSlice.ts";
import { workbenchStore, type WorkbenchStore } from "../store.ts";

/** A laid-out node as the graph holds it: its 0-based node number and position. */
export interface PlacedNode {
  readonly index: number;
  x: number;
  y: number;
}

const sameLandmarks = (kept: readonly number[], landmarks: Uint32Array): boolean =>
  kept.length === landmarks.length && kept.every((row, k) => row === landmarks[k]);

/**
 * The graph's side of the layout handshake, when its simulation comes to rest: the nodes'
 * positions go to the store (the session keeps them). Positions that are not finite are not kept.
 */
export function keepLayoutPositions(result: CoverResult, nodes: readonly PlacedNode[], store: WorkbenchStore = workbenchStore): void {
  if (nodes.length !== result.landmarks.length || !nodes.every((n) => Number.isFinite(n.x) && Number.isFinite(n.y))) return;
  store.setState({ layoutPositions: { landmarks: Array.from(result.landmarks), x: nodes.map((n) => n.x), y: nodes.map((n) => n.y) } });
}

/**
 * The other side, before a simulation starts: when the store holds positions of this very build
 * (the same landmark rows, as after restoring a session), the nodes start there; true if they did.
 */
export function seedLayoutPositions(result: CoverResult, nodes: readonly PlacedNode[], store: WorkbenchStore = workbenchStore): boolean {
  const kept: LayoutPositions | null = store.getState().layoutPositions;
  if (!kept || nodes.length !== kept.x.length || !sameLandmarks(kept.landmarks, result.landmarks)) return false;
  for (const node of nodes) {
    node.x = kept.x[node.index]!;
    node.y = kept.y[node.index]!;
  }
  return true;
}
