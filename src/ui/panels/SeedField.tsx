import { useEffect, useState } from "react";
import { actions } from "../../state/actions.ts";
import { useWorkbench } from "../useWorkbench.ts";

/** The landmark seed, committed on Enter or when the field loses focus (not on every keystroke). */
export function SeedField() {
  const seed = useWorkbench((s) => s.seed);
  const landmarks = useWorkbench((s) => s.landmarks);
  const [text, setText] = useState(String(seed));
  useEffect(() => setText(String(seed)), [seed]);
  const commit = (): void => {
    const value = Number(text);
    if (text.trim() !== "" && Number.isInteger(value) && value !== seed) void actions().setSeed(value);
    else setText(String(seed));
  };
  return (
    <label>
      Seed
      <input
        type="number"
        step={1}
        value={text}
        disabled={landmarks === "greedy"}
        title="Seeds the shuffled order or the farthest-point start; the same seed gives the same landmarks"
        onChange={(e) => setText(e.currentTarget.value)}
        onBlur={commit}
        onKeyDown={(e) => {
          if (e.key === "Enter") commit();
        }}
      />
    </label>
  );
}
