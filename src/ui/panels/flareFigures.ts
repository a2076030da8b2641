/**
 * Figures the "How to read this" guide quotes from the demo table (public/demo/pump-fleet.csv, roles
 * as the workbench opens it, default radius). Rounded as the guide prints them; a test rebuilds the
 * demo and checks each within half a unit of its last digit, so a change to the generator or the
 * defaults that moves them fails there instead of leaving the guide wrong.
 */
export const flareFigures = {
  radius: 0.417,
  nodes: 73,
  edges: 95,
  components: 1,
  b1: 1,
  rowsUsed: 2349,
  /** The five nodes with the highest share failed within 90 days, highest first. */
  flareNodes: [9, 37, 61, 15, 35],
  /** Share failed within 90 days in nodes 9 and 37. */
  topNodeShares: [0.72, 0.69],
  rowsInside: 157,
  failedInside: 0.5,
  failedOutside: 0.05,
  vibrationInside: 7.7,
  vibrationOutside: 2.7,
  suctionInside: 67,
  suctionOutside: 210,
  ageInside: 22,
  ageOutside: 12,
  /** Nodes of the top hotspot of failed_within_90d at the scan's defaults (K = 8, high). */
  hotspotNodes: [3, 9, 15, 35, 37, 42, 43, 61],
} as const;
