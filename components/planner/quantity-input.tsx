"use client";
import { useId, useState } from "react";
import type { UnitSystem } from "@/lib/domain";
import { decimalsOf, fromDisplay, toDisplay, unitOf, type Quantity } from "@/lib/units";

interface QuantityInputProps {
  label: string;
  quantity: Quantity;
  valueSI: number | null;
  unitSystem: UnitSystem;
  minSI: number;
  maxSI: number;
  onCommit: (valueSI: number | null) => void;
  /** Leave empty to mean "not set" (e.g. temperature: use the standard atmosphere). */
  optional?: boolean;
  placeholder?: string;
  testId?: string;
  disabled?: boolean;
}

/**
 * A number field in the person's own units. The engine only ever sees SI: the field converts on
 * commit, and refuses (with a message, writing nothing) what is not a number or out of range.
 */
export function QuantityInput({
  label,
  quantity,
  valueSI,
  unitSystem,
  minSI,
  maxSI,
  onCommit,
  optional = false,
  placeholder,
  testId,
  disabled = false,
}: QuantityInputProps) {
  const id = useId();
  const decimals = decimalsOf(quantity, unitSystem) + 1;
  const shown = valueSI === null ? "" : String(Number(toDisplay(quantity, valueSI, unitSystem).toFixed(decimals)));
  const [text, setText] = useState(shown);
  const [error, setError] = useState<string | null>(null);
  // A new value from outside (a drag, a unit switch) replaces what the field shows, during render.
  const [lastShown, setLastShown] = useState(shown);
  if (shown !== lastShown) {
    setLastShown(shown);
    setText(shown);
  }

  const commit = (raw: string) => {
    const trimmed = raw.trim();
    if (trimmed === "" && optional) {
      setError(null);
      onCommit(null);
      return;
    }
    const display = Number(trimmed.replace(",", "."));
    const lo = toDisplay(quantity, minSI, unitSystem);
    const hi = toDisplay(quantity, maxSI, unitSystem);
    const [min, max] = lo <= hi ? [lo, hi] : [hi, lo];
    if (trimmed === "" || !Number.isFinite(display)) {
      setError("Enter a number.");
      return;
    }
    if (display < min - 1e-9 || display > max + 1e-9) {
      setError(`Between ${Number(min.toFixed(decimals))} and ${Number(max.toFixed(decimals))} ${unitOf(quantity, unitSystem)}.`);
      return;
    }
    setError(null);
    onCommit(fromDisplay(quantity, display, unitSystem));
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
        <span className="unit text-muted">{unitOf(quantity, unitSystem)}</span>
      </div>
      {error && (
        <p id={`${id}-error`} className="mt-0.5 text-xs text-flag-stop" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}
