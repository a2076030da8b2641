import type { ColumnRole } from "../../state/slices/paramsSlice.ts";

const labels: Record<ColumnRole, string> = { feature: "feature", outcome: "outcome", id: "row label", ignore: "not used" };

/** The words for a column's role on screen; a non-numeric feature enters through one-hot indicators. */
export function roleLabel(role: ColumnRole, numeric: boolean): string {
  return role === "feature" && !numeric ? "feature (one-hot)" : labels[role];
}
