"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useState } from "react";
import { deleteSetupRequest, duplicateSetupRequest } from "@/lib/client/api";

export function SetupRowActions({ id, name }: { id: string; name: string }) {
  const router = useRouter();
  const [confirming, setConfirming] = useState(false);
  const done = () => {
    setConfirming(false);
    router.refresh();
  };
  const duplicate = useMutation({ mutationFn: () => duplicateSetupRequest(id), onSuccess: done });
  const remove = useMutation({
    mutationFn: () => deleteSetupRequest(id),
    onSuccess: () => {
      done();
      // The row and its buttons go away: focus the page's main content rather than leave it to the body.
      document.getElementById("main")?.focus();
    },
  });
  const pending = duplicate.isPending || remove.isPending;
  const error = duplicate.error ?? remove.error;
  return (
    // Stacked in the narrow actions column of a phone's table, in a row beside the other columns from md up.
    <span className="flex min-w-[6.5rem] flex-col items-start gap-1 text-sm md:min-w-0 md:flex-row md:flex-wrap md:items-center md:gap-2">
      <button
        type="button"
        disabled={pending}
        className="text-accent underline"
        onClick={() => duplicate.mutate()}
        aria-label={`Duplicate ${name}`}
      >
        Duplicate
      </button>
      {confirming ? (
        <span className="flex flex-wrap items-center gap-1" role="group" aria-label="Confirm delete">
          <span>Delete for good?</span>
          <button
            type="button"
            disabled={pending}
            className="rounded bg-flag-stop px-2 py-0.5 text-white"
            onClick={() => remove.mutate()}
            data-testid="confirm-delete"
          >
            Delete
          </button>
          <button type="button" className="underline" onClick={() => setConfirming(false)}>
            Keep
          </button>
        </span>
      ) : (
        <button type="button" className="text-flag-stop underline" onClick={() => setConfirming(true)} aria-label={`Delete ${name}`}>
          Delete
        </button>
      )}
      {error && (
        <span role="alert" className="text-flag-stop">
          {error.message}
        </span>
      )}
    </span>
  );
}
