import type { InputHTMLAttributes } from "react";

interface SettingFieldProps extends Omit<InputHTMLAttributes<HTMLInputElement>, "id" | "value"> {
  readonly id: string;
  readonly label: string;
  readonly value: string;
  /** Why the typed value is ignored, or null when it is valid. */
  readonly error: string | null;
}

/** A number field that keeps showing what was typed; an invalid value is named beside it and tied to it for screen readers. */
export function SettingField({ id, label, value, error, ...input }: SettingFieldProps) {
  const errorId = `${id}-error`;
  return (
    <div className="setting-field">
      <label htmlFor={id}>{label}</label>
      <input id={id} type="number" value={value} aria-invalid={error !== null} {...(error !== null ? { "aria-describedby": errorId } : {})} {...input} />
      {error !== null && <span id={errorId} className="field-error">{error}</span>}
    </div>
  );
}
