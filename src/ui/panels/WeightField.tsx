import { useEffect, useState } from "react";
import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** A feature's weight (factor after scaling), committed on Enter or blur. */
export function WeightField({ column }: { column: string }) {
  const weight = useWorkbench((s) => s.weights[column] ?? 1);
  const [text, setText] = useState(String(weight));
  useEffect(() => setText(String(weight)), [weight]);
  const commit = (): void => {
    const value = Number(text);
    if (text.trim() !== "" && value >= 0 && Number.isFinite(value) && value !== weight) void actions().setWeight(column, value);
    else setText(String(weight));
  };
  return (
    <input
      className="weight"
      type="number"
      min={0}
      step="any"
      aria-label={`weight of ${column}`}
      title="Multiplies this feature after scaling (1 = as scaled, 0 = ignored by the distance)"
      value={text}
      onChange={(e) => setText(e.currentTarget.value)}
      onBlur={commit}
      onKeyDown={(e) => {
        if (e.key === "Enter") commit();
      }}
    />
  );
}
