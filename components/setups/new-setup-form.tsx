"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useId } from "react";
import { ApiError, createSetupRequest } from "@/lib/client/api";
import { newSetupProblemOf, type NewSetupField, type NewSetupProblem } from "./new-setup-problem";

/** Where the form posts when JavaScript is off (or not loaded yet): the same schema and core as POST /api/setups. */
export const NEW_SETUP_FORM_ACTION = "/api/forms/new-setup";

interface NewSetupFormProps {
  models: { id: string; name: string; gasVolumeM3: number }[];
  /** A refusal of the no-JavaScript post, with what was typed, so nothing has to be typed again. */
  refused?: { problem: NewSetupProblem; name: string; modelId: string } | null;
}

// A real form post that works without JavaScript; with it, the same fields go to the JSON route from a
// mutation, and its errors show inline without leaving the page.
export function NewSetupForm({ models, refused = null }: NewSetupFormProps) {
  const router = useRouter();
  const ids = useId();
  const create = useMutation({
    mutationFn: (input: { modelId: string; name: string }) => createSetupRequest(input),
    onSuccess: ({ id }) => router.push(`/setups/${id}`),
  });
  const problem: NewSetupProblem | null = create.error
    ? create.error instanceof ApiError
      ? newSetupProblemOf(create.error.error)
      : { field: null, message: create.error.message }
    : (refused?.problem ?? null);
  const errorId = `${ids}-error`;
  const invalid = (field: NewSetupField) =>
    problem?.field === field ? { "aria-invalid": true as const, "aria-describedby": errorId } : {};
  const knownModel = models.some((m) => m.id === refused?.modelId) ? refused?.modelId : undefined;
  return (
    <form
      method="post"
      action={NEW_SETUP_FORM_ACTION}
      className="grid w-full gap-2 sm:flex sm:w-auto sm:flex-wrap sm:items-end"
      data-testid="new-setup-form"
      onSubmit={(event) => {
        event.preventDefault();
        const data = new FormData(event.currentTarget);
        create.mutate({ modelId: String(data.get("modelId") ?? ""), name: String(data.get("name") ?? "") });
      }}
    >
      <label className="text-sm text-muted">
        Name
        <input
          name="name"
          defaultValue={refused?.name ?? ""}
          placeholder="e.g. Orchard camera, north field"
          autoComplete="off"
          className="mt-0.5 block w-full rounded border border-hairline bg-white px-2 py-1 text-ink sm:w-56"
          data-testid="new-setup-name"
          {...invalid("name")}
        />
      </label>
      <label className="text-sm text-muted">
        Envelope model
        <select
          name="modelId"
          defaultValue={knownModel}
          className="mt-0.5 block w-full rounded border border-hairline bg-white px-2 py-1 text-ink sm:w-auto"
          {...invalid("modelId")}
        >
          {models.map((m) => (
            <option key={m.id} value={m.id}>
              {m.name} ({m.gasVolumeM3.toFixed(2)} m³)
            </option>
          ))}
        </select>
      </label>
      <button
        type="submit"
        disabled={create.isPending || create.isSuccess}
        className="rounded bg-accent px-3 py-1.5 text-sm font-medium text-white disabled:opacity-60"
        data-testid="new-setup"
      >
        New setup
      </button>
      {problem && (
        <p id={errorId} role="alert" className="text-sm text-flag-stop sm:basis-full" data-testid="new-setup-problem">
          {problem.message}
        </p>
      )}
    </form>
  );
}
