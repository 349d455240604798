"use client";
import { NumberInput } from "@/components/ui/number-input";
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

/** A number field in the person's own units. The engine only ever sees SI: the field converts on commit. */
export function QuantityInput({ quantity, valueSI, unitSystem, minSI, maxSI, onCommit, ...field }: QuantityInputProps) {
  const lo = toDisplay(quantity, minSI, unitSystem);
  const hi = toDisplay(quantity, maxSI, unitSystem);
  return (
    <NumberInput
      {...field}
      value={valueSI === null ? null : toDisplay(quantity, valueSI, unitSystem)}
      decimals={decimalsOf(quantity, unitSystem) + 1}
      min={Math.min(lo, hi)}
      max={Math.max(lo, hi)}
      unit={unitOf(quantity, unitSystem)}
      onCommit={(shown) => onCommit(shown === null ? null : fromDisplay(quantity, shown, unitSystem))}
    />
  );
}
