"use client";
import { useRouter } from "next/navigation";
import { useState, useTransition } from "react";
import { deleteSetupAction, duplicateSetupAction } from "@/app/(app)/setups/actions";

export function SetupRowActions({ id, name }: { id: string; name: string }) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const [pending, startTransition] = useTransition();
  const run = (work: () => Promise<{ ok: boolean; error?: { message: string } }>) =>
    startTransition(async () => {
      const result = await work();
      if (!result.ok) setError(result.error?.message ?? "That did not work.");
      else {
        setConfirming(false);
        router.refresh();
      }
    });
  return (
    <span className="flex flex-wrap items-center gap-2 text-sm">
      <button type="button" disabled={pending} className="text-accent underline" onClick={() => run(() => duplicateSetupAction({ id }))} aria-label={`Duplicate ${name}`}>
        Duplicate
      </button>
      {confirming ? (
        <span className="flex items-center gap-1" role="group" aria-label="Confirm delete">
          <span>Delete for good?</span>
          <button type="button" disabled={pending} className="rounded bg-flag-stop px-2 py-0.5 text-white" onClick={() => run(() => deleteSetupAction({ id }))} data-testid="confirm-delete">
            Delete
          </button>
          <button type="button" className="underline" onClick={() => setConfirming(false)}>Keep</button>
        </span>
      ) : (
        <button type="button" className="text-flag-stop underline" onClick={() => setConfirming(true)} aria-label={`Delete ${name}`}>
          Delete
        </button>
      )}
      {error && <span role="alert" className="text-flag-stop">{error}</span>}
    </span>
  );
}
