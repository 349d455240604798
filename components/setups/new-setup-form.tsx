"use client";
import { useActionState } from "react";
import { createSetupAction } from "@/app/(app)/setups/actions";

interface NewSetupFormProps {
  models: { id: string; name: string; gasVolumeM3: number }[];
}

export function NewSetupForm({ models }: NewSetupFormProps) {
  const [state, action, pending] = useActionState(createSetupAction, null);
  return (
    <form action={action} className="flex flex-wrap items-end gap-2" data-testid="new-setup-form">
      <label className="text-sm text-muted">
        Envelope model
        <select name="modelId" className="mt-0.5 block rounded border border-hairline bg-white px-2 py-1">
          {models.map((m) => (
            <option key={m.id} value={m.id}>{m.name} ({m.gasVolumeM3.toFixed(2)} m³)</option>
          ))}
        </select>
      </label>
      <button type="submit" disabled={pending} className="rounded bg-accent px-3 py-1.5 text-sm font-medium text-white disabled:opacity-60" data-testid="new-setup">
        New setup
      </button>
      {state && !state.ok && <p role="alert" className="text-sm text-flag-stop">{state.error.message}</p>}
    </form>
  );
}
