"use client";
import { useId } from "react";
import { get, type FieldErrors, type FieldValues, type UseFormRegister } from "react-hook-form";
import type { UnitSystem } from "@/lib/domain";
import { unitLabel } from "./si-form";

interface FieldProps {
  path: string;
  label: string;
  register: UseFormRegister<FieldValues>;
  errors: FieldErrors<FieldValues>;
  hint?: string;
  testId?: string;
}

/** The message react-hook-form holds for a dotted path, if any. */
export function errorAt(errors: FieldErrors<FieldValues>, path: string): string | null {
  const found = get(errors, path) as { message?: unknown } | undefined;
  return found && typeof found.message === "string" ? found.message : null;
}

interface NumberFieldProps extends FieldProps {
  quantity?: Parameters<typeof unitLabel>[0]["quantity"];
  plainUnit?: string;
  unitSystem: UnitSystem;
  placeholder?: string;
}

/** A number in the maker's units, with its unit after the box and the schema's message below it. */
export function NumberField({
  path,
  label,
  register,
  errors,
  quantity,
  plainUnit = "",
  unitSystem,
  placeholder,
  hint,
  testId,
}: NumberFieldProps) {
  const id = useId();
  const error = errorAt(errors, path);
  return (
    <div className="text-sm">
      <label htmlFor={id} className="block text-muted">
        {label}
      </label>
      <div className="mt-0.5 flex items-center gap-1">
        <input
          id={id}
          {...register(path)}
          inputMode="decimal"
          placeholder={placeholder}
          aria-invalid={error ? true : undefined}
          aria-describedby={hint ? `${id}-hint` : undefined}
          data-testid={testId}
          className={`figure w-28 rounded border bg-white px-2 py-1 ${error ? "border-flag-stop" : "border-hairline"}`}
        />
        <span className="text-muted">{unitLabel({ quantity }, unitSystem, plainUnit)}</span>
      </div>
      {hint && (
        <p id={`${id}-hint`} className="text-xs text-muted">
          {hint}
        </p>
      )}
      {error && (
        <p className="mt-0.5 text-xs text-flag-stop" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}

interface TextFieldProps extends FieldProps {
  multiline?: boolean;
  className?: string;
}

export function TextField({ path, label, register, errors, hint, testId, multiline = false, className = "" }: TextFieldProps) {
  const id = useId();
  const error = errorAt(errors, path);
  const box = `mt-0.5 w-full rounded border bg-white px-2 py-1 ${error ? "border-flag-stop" : "border-hairline"}`;
  return (
    <div className={`text-sm ${className}`}>
      <label htmlFor={id} className="block text-muted">
        {label}
      </label>
      {multiline ? (
        <textarea id={id} {...register(path)} rows={2} className={box} data-testid={testId} />
      ) : (
        <input id={id} {...register(path)} className={box} data-testid={testId} aria-invalid={error ? true : undefined} />
      )}
      {hint && <p className="text-xs text-muted">{hint}</p>}
      {error && (
        <p className="mt-0.5 text-xs text-flag-stop" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}

interface SelectFieldProps extends FieldProps {
  options: readonly { value: string; label: string }[];
}

export function SelectField({ path, label, register, errors, options, testId }: SelectFieldProps) {
  const id = useId();
  const error = errorAt(errors, path);
  return (
    <div className="text-sm">
      <label htmlFor={id} className="block text-muted">
        {label}
      </label>
      <select id={id} {...register(path)} className="mt-0.5 w-full rounded border border-hairline bg-white px-2 py-1" data-testid={testId}>
        {options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
      {error && (
        <p className="mt-0.5 text-xs text-flag-stop" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}

/** Puts a server's field issues ("hull.lengthM": message) beside the fields; the rest go to the form's message. */
export function applyServerIssues(
  issues: readonly { path: string; message: string }[] | undefined,
  setError: (path: string, error: { message: string }) => void,
  known: (path: string) => boolean,
): string[] {
  const unplaced: string[] = [];
  for (const issue of issues ?? []) {
    if (known(issue.path)) setError(issue.path, { message: issue.message });
    else unplaced.push(`${issue.path}: ${issue.message}`);
  }
  return unplaced;
}
