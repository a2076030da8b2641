import { useEffect, useState, type ChangeEvent, type KeyboardEvent } from "react";

const shown = (value: number): string => (Number.isNaN(value) ? "" : String(value));

/**
 * Props for a number field that edits freely and commits on Enter or when it loses focus:
 * a valid new value goes to `commit`, anything else puts the current value back.
 */
export function useCommittedNumber(current: number, isValid: (value: number) => boolean, commit: (value: number) => void) {
  const [text, setText] = useState(shown(current));
  useEffect(() => setText(shown(current)), [current]);
  const apply = (): void => {
    const value = Number(text);
    if (text.trim() !== "" && isValid(value) && value !== current) commit(value);
    else setText(shown(current));
  };
  return {
    value: text,
    onChange: (event: ChangeEvent<HTMLInputElement>) => setText(event.currentTarget.value),
    onBlur: apply,
    onKeyDown: (event: KeyboardEvent<HTMLInputElement>) => {
      if (event.key === "Enter") apply();
    },
  };
}
