"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { createSetupRequest } from "@/lib/client/api";

interface NewSetupFormProps {
  models: { id: string; name: string; gasVolumeM3: number }[];
}

export function NewSetupForm({ models }: NewSetupFormProps) {
  const router = useRouter();
  const create = useMutation({
    mutationFn: (modelId: string) => createSetupRequest({ modelId }),
    onSuccess: ({ id }) => router.push(`/setups/${id}`),
  });
  return (
    <form
      className="flex flex-wrap items-end gap-2"
      data-testid="new-setup-form"
      onSubmit={(event) => {
        event.preventDefault();
        create.mutate(String(new FormData(event.currentTarget).get("modelId") ?? ""));
      }}
    >
      <label className="text-sm text-muted">
        Envelope model
        <select name="modelId" className="mt-0.5 block rounded border border-hairline bg-white px-2 py-1">
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
      {create.error && (
        <p role="alert" className="text-sm text-flag-stop">
          {create.error.message}
        </p>
      )}
    </form>
  );
}
