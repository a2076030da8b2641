/** A point in screen pixels. */
export interface Point {
  readonly x: number;
  readonly y: number;
}

/**
 * Point in polygon by the even–odd rule: cast a ray from the point towards +x and count the edges
 * it crosses; an odd count is inside. Each edge (a, b) counts when it straddles the ray's height
 * (a.y > y) ≠ (b.y > y), and the crossing lies to the right of the point. The half-open test on y
 * counts a vertex on the ray once. The polygon closes itself (last vertex back to the first).
 * Source: M. Shimrat, "Algorithm 112: Position of point relative to polygon", Commun. ACM 5(8):434, 1962.
 * Degenerate input: fewer than three vertices enclose nothing (false). O(v) for v vertices.
 * @example isInsidePolygon({ x: 1, y: 1 }, [{ x: 0, y: 0 }, { x: 2, y: 0 }, { x: 2, y: 2 }, { x: 0, y: 2 }]) // => true
 */
export function isInsidePolygon(point: Point, polygon: readonly Point[]): boolean {
  const n = polygon.length;
  if (n < 3) return false;
  let inside = false;
  for (let i = 0, j = n - 1; i < n; j = i++) {
    const a = polygon[i]!;
    const b = polygon[j]!;
    if (a.y > point.y !== b.y > point.y && point.x < ((b.x - a.x) * (point.y - a.y)) / (b.y - a.y) + a.x) inside = !inside;
  }
  return inside;
}

/** Indices of the points inside the polygon (even–odd rule), ascending. O(p·v). */
export function pointsInPolygon(points: readonly (Point & { readonly index: number })[], polygon: readonly Point[]): number[] {
  return points.filter((p) => isInsidePolygon(p, polygon)).map((p) => p.index).sort((a, b) => a - b);
}
