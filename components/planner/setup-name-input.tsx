"use client";
import { useId, useState } from "react";
import { useFieldError } from "@/components/ui/field-issues";
import { MAX_NAME_LENGTH } from "@/lib/domain";
import { usePlanner, usePlannerActions } from "./planner-context";

const LABEL = "Setup name";
export const EMPTY_NAME_MESSAGE = "Give the setup a name";

/** The setup's name: an empty one stays empty with its message (and keeps Save from going ahead). */
export function SetupNameInput({ className }: { className: string }) {
  const id = useId();
  const name = usePlanner((s) => s.draft.name);
  const { setName } = usePlannerActions();
  const [text, setText] = useState(name);
  const { error, setError } = useFieldError(id, LABEL);

  const commit = (raw: string) => {
    const value = raw.trim();
    if (value === "") return setError(EMPTY_NAME_MESSAGE);
    setError(null);
    if (value !== name) setName(value);
  };

  return (
    <div className="text-sm sm:col-span-2">
      <label htmlFor={id} className="block text-muted">
        {LABEL}
      </label>
      <input
        id={id}
        className={error ? className.replace("border-hairline", "border-flag-stop") : className}
        value={text}
        maxLength={MAX_NAME_LENGTH}
        aria-invalid={error ? true : undefined}
        aria-describedby={error ? `${id}-error` : undefined}
        data-testid="setup-name-input"
        onChange={(e) => setText(e.target.value)}
        onBlur={(e) => commit(e.target.value)}
        onKeyDown={(e) => {
          if (e.key === "Enter") commit((e.target as HTMLInputElement).value);
        }}
      />
      {error && (
        <p id={`${id}-error`} className="mt-0.5 text-xs text-flag-stop" role="alert">
          {error}
        </p>
      )}
    </div>
  );
}
