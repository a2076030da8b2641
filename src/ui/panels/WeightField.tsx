import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { useCommittedNumber } from "./useCommittedNumber.ts";

/** A feature's weight (factor after scaling), committed on Enter or blur. */
export function WeightField({ column }: { column: string }) {
  const weight = useWorkbench((s) => s.weights[column] ?? 1);
  const field = useCommittedNumber(weight, (value) => value >= 0 && Number.isFinite(value), (value) => void actions().setWeight(column, value));
  return (
    <input
      className="weight"
      type="number"
      min={0}
      step="any"
      aria-label={`weight of ${column}`}
      title="Multiplies this feature after scaling (1 = as scaled, 0 = ignored by the distance)"
      {...field}
    />
  );
}
