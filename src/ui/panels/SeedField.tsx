import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";
import { useCommittedNumber } from "./useCommittedNumber.ts";

/** The landmark seed, committed on Enter or when the field loses focus (not on every keystroke). */
export function SeedField() {
  const seed = useWorkbench((s) => s.seed);
  const landmarks = useWorkbench((s) => s.landmarks);
  const field = useCommittedNumber(seed, Number.isInteger, (value) => void actions().setSeed(value));
  return (
    <label>
      Seed
      <input
        type="number"
        step={1}
        disabled={landmarks === "greedy-file-order"}
        title="Seeds the shuffled order or the farthest-point start; the same seed gives the same landmarks"
        {...field}
      />
    </label>
  );
}
