import type { CoverResult } from "../cover/buildCover.ts";
import type { ParsedTable } from "../table/types.ts";
import { coverGeometry } from "./coverGeometry.ts";
import { countFamily } from "./flexibleFamily.ts";
import { hotspotDefaults } from "./hotspotDefaults.ts";
import { landmarkNeighbours } from "./landmarkNeighbours.ts";

/**
 * Exact size of the flexibly shaped candidate family for K = maxNodes (flexibleFamily's
 * enumeration, before the cap of half the scanned rows, which depends on the outcome), so the
 * caller can show it, and the expected time, before a scan starts. O(L²·d + L·2^(K−1)·K).
 * @example countCandidateSets(parsed, result of a 3-node path, 3) // => 6
 */
export function countCandidateSets(parsed: ParsedTable, result: CoverResult, maxNodes: number): number {
  if (!Number.isInteger(maxNodes) || maxNodes < 1 || maxNodes > hotspotDefaults.maxNodesLimit) throw new Error(`invalid maximum nodes: ${maxNodes} (1 to ${hotspotDefaults.maxNodesLimit})`);
  const geometry = coverGeometry(parsed, result);
  return countFamily({ neighbours: landmarkNeighbours(geometry, maxNodes), source: result.edges.source, target: result.edges.target });
}
