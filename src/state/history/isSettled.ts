import type { CoverParams } from "../../core/index.ts";
import { selectCoverParams } from "../selectors.ts";
import type { WorkbenchState } from "../store.ts";

const sameParams = (a: CoverParams, b: CoverParams): boolean => {
  const keys = new Set([...Object.keys(a), ...Object.keys(b)]) as Set<keyof CoverParams>;
  return [...keys].every((key) => JSON.stringify(a[key]) === JSON.stringify(b[key]));
};

/**
 * True when what the screen shows is the answer to the parameters in force: a table is loaded,
 * nothing is being read or built, and the graph is the build of today's parameters (or there is
 * none to build, or the last build failed). Between a new metric and its default radius's build,
 * for instance, it is false: no undo step is taken of a state that never had its graph.
 */
export function isSettled(s: WorkbenchState): boolean {
  if (!s.table || s.loadStatus !== "ready" || s.build.state === "running") return false;
  if (s.build.state === "failed") return true;
  const params = selectCoverParams(s);
  if (!params) return s.result === null;
  return s.result !== null && sameParams(s.result.params, params);
}
