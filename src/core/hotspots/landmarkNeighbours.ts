import type { CoverGeometry } from "./coverGeometry.ts";

/**
 * For each node i, the K − 1 nodes whose landmarks are nearest to i's landmark under the build's
 * metric (ties to the lower node number), nearest first; fewer when the graph has fewer nodes.
 * This is the neighbourhood of the flexibly shaped scan: Tango and Takahashi, Int J Health Geogr
 * 4:11, 2005 (there by distance between region centroids; here between landmarks). O(L²·d) for
 * L nodes and d columns, plus a sort of L per node.
 * @example landmarkNeighbours(landmarks at 0, 1, 3, 4 on a line, K = 3) // => [[1, 2], [0, 2], [3, 1], [2, 1]]
 */
export function landmarkNeighbours({ table, metric, landmarkPositions }: Pick<CoverGeometry, "table" | "metric" | "landmarkPositions">, maxNodes: number): Uint32Array[] {
  const count = landmarkPositions.length;
  const take = Math.min(maxNodes - 1, count - 1);
  const distances = new Float64Array(count);
  const order = Array.from({ length: count }, (_, j) => j);
  const result: Uint32Array[] = [];
  for (let i = 0; i < count; ++i) {
    for (let j = 0; j < count; ++j) distances[j] = metric.distance(table.values, table.columns, landmarkPositions[i]!, landmarkPositions[j]!);
    distances[i] = -Infinity; // i itself is not its own neighbour
    order.sort((a, b) => distances[a]! - distances[b]! || a - b);
    result.push(Uint32Array.from(order.slice(1, 1 + take)));
  }
  return result;
}
