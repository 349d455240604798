"use client";
import { useId, useState } from "react";
import { NOT_A_NUMBER_MESSAGE, parseNumber } from "@/lib/parse-number";
import { useFieldError } from "./field-issues";

export interface NumberInputProps {
  label: string;
  /** The value in the units shown; null: empty. */
  value: number | null;
  /** Decimals the value is shown with. */
  decimals: number;
  /** Bounds in the units shown. */
  min: number;
  max: number;
  unit?: string;
  /** Receives the typed value in the units shown, only when it is valid and differs from the one shown. */
  onCommit: (value: number | null) => void;
  /** Empty means "not set" (e.g. temperature: use the standard atmosphere). */
  optional?: boolean;
  placeholder?: string;
  testId?: string;
  disabled?: boolean;
}

const shownText = (value: number | null, decimals: number): string => (value === null ? "" : String(Number(value.toFixed(decimals))));

/**
 * A number field. It commits only a value that was typed and differs from the one shown (leaving the
 * field untouched writes nothing back, not even a rounding), and it never replaces what was typed: a
 * value it cannot read or that is out of range stays in the field with its message, and is reported
 * to the surrounding form so that the form refuses to save while it is there.
 */
export function NumberInput({
  label,
  value,
  decimals,
  min,
  max,
  unit = "",
  onCommit,
  optional = false,
  placeholder,
  testId,
  disabled = false,
}: NumberInputProps) {
  const id = useId();
  const shown = shownText(value, decimals);
  const [text, setText] = useState(shown);
  const { error, setError, clearDuringRender } = useFieldError(id, label);
  // A new value from outside (a drag, a unit switch) replaces what the field shows, during render.
  const [lastShown, setLastShown] = useState(shown);
  if (shown !== lastShown) {
    setLastShown(shown);
    setText(shown);
    if (error) clearDuringRender();
  }

  const commit = (raw: string) => {
    if (raw === shown) return setError(null);
    const parsed = parseNumber(raw);
    if (!parsed.ok && parsed.reason === "empty" && optional) {
      setError(null);
      if (value !== null) onCommit(null);
      return;
    }
    if (!parsed.ok) return setError(parsed.reason === "empty" ? NOT_A_NUMBER_MESSAGE : parsed.message);
    const typed = parsed.value;
    const suffix = unit ? ` ${unit}` : "";
    const bounds = `Between ${shownText(min, decimals)} and ${shownText(max, decimals)}${suffix}`;
    if (typed < min - 1e-9) return setError(`${bounds}: ${typed}${suffix} is too low.`);
    if (typed > max + 1e-9) return setError(`${bounds}: ${typed}${suffix} is too high.`);
    setError(null);
    // The same figure written differently ("3.0" for "3") keeps the value as it is, unrounded.
    if (value !== null && typed === Number(shown)) return;
    onCommit(typed);
  };

  return (
    <div className="text-sm">
      <label htmlFor={id} className="block text-muted">
        {label}
      </label>
      <div className="mt-0.5 flex items-center gap-1">
        <input
          id={id}
          inputMode="decimal"
          autoComplete="off"
          value={text}
          placeholder={placeholder}
          disabled={disabled}
          aria-invalid={error ? true : undefined}
          aria-describedby={error ? `${id}-error` : undefined}
          data-testid={testId}
          className={`figure w-28 rounded border bg-white px-2 py-1 ${error ? "border-flag-stop" : "border-hairline"}`}
          onChange={(e) => setText(e.target.value)}
          onBlur={(e) => commit(e.target.value)}
          onKeyDown={(e) => {
            if (e.key === "Enter") commit((e.target as HTMLInputElement).value);
          }}
        />
        {unit && <span className="unit text-muted">{unit}</span>}
      </div>
      {error && (
        <p id={`${id}-error`} className="mt-0.5 text-xs text-flag-stop" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}
