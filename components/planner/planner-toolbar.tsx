"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useEffect, useRef, useState } from "react";
import { worstLevel } from "@/lib/balance";
import { FlagBadge } from "@/components/ui/flag-badge";
import { focusField, inPageOrder, type FieldIssue } from "@/components/ui/field-issues";
import { ApiError, savePreferencesRequest, saveSetupRequest, submitSetupRequest } from "@/lib/client/api";
import { usePlanner, usePlannerActions, usePlannerStoreApi } from "./planner-context";

const STATUS_WORDS = {
  draft: "draft",
  submitted: "submitted for review",
  changes_requested: "changes requested",
  approved: "approved",
} as const;

interface Message {
  kind: "ok" | "error";
  text: string;
  conflict?: boolean;
  /** The fields that keep Save or Submit from going ahead. */
  fields?: FieldIssue[];
}

export function PlannerToolbar() {
  const store = usePlannerStoreApi();
  const actions = usePlannerActions();
  const setupId = usePlanner((s) => s.setupId);
  const name = usePlanner((s) => s.draft.name);
  const status = usePlanner((s) => s.status);
  const version = usePlanner((s) => s.version);
  const dirty = usePlanner((s) => s.dirty);
  const worst = usePlanner((s) => worstLevel(s.result.flags));
  const unitSystem = usePlanner((s) => s.unitSystem);
  const fieldIssues = usePlanner((s) => s.fieldIssues);
  const router = useRouter();
  const [acknowledged, setAcknowledged] = useState(false);
  const [message, setMessage] = useState<Message | null>(null);
  // After Save or Submit, focus goes to the result rather than falling to the page body (a refusal
  // for bad fields sends it to the first of them instead).
  const messageRef = useRef<HTMLParagraphElement>(null);
  useEffect(() => {
    if (message && !message.fields) messageRef.current?.focus();
  }, [message]);

  /** Refuses (naming the fields, sending nothing) while any field shows an error. */
  const refusedForFields = (what: "saved" | "submitted"): boolean => {
    const issues = inPageOrder(Object.values(store.getState().fieldIssues));
    if (issues.length === 0) return false;
    setMessage({
      kind: "error",
      text: `Nothing was ${what}. Fix ${issues.length === 1 ? "this field" : "these fields"} first:`,
      fields: issues,
    });
    focusField(issues[0].id);
    return true;
  };

  const report = (error: unknown) =>
    setMessage({
      kind: "error",
      text: error instanceof ApiError ? error.message : "The server could not be reached; nothing was saved.",
      conflict: error instanceof ApiError && error.status === 409,
    });

  const save = useMutation({
    mutationFn: () => {
      const { draft, version: v } = store.getState();
      return saveSetupRequest(setupId, v, draft);
    },
    onSuccess: (saved) => {
      actions.markSaved(saved);
      setMessage({ kind: "ok", text: `Saved (version ${saved.version}).` });
      // The decision banner and the discussion around the Planner are server-rendered: bring them up to date.
      router.refresh();
    },
    onError: report,
  });
  const submit = useMutation({
    mutationFn: () => submitSetupRequest(setupId, store.getState().version, acknowledged),
    onSuccess: (done) => {
      actions.markSaved(done);
      setMessage({ kind: "ok", text: "Submitted to the review desk." });
      router.refresh();
    },
    onError: report,
  });
  const units = useMutation({
    mutationFn: savePreferencesRequest,
    onSuccess: ({ unitSystem: u }) => actions.setUnitSystem(u),
    onError: report,
  });

  const canSubmit =
    !dirty && worst !== "stop" && (worst !== "caution" || acknowledged) && (status === "draft" || status === "changes_requested");
  const reopensHint =
    dirty && (status === "submitted" || status === "approved")
      ? "Saving changes takes this setup back to draft; it will need a new review."
      : null;
  const submitHint =
    worst === "stop"
      ? "A stop flag blocks submitting; a draft can still be saved."
      : dirty
        ? "Save first: the review desk sees the saved setup."
        : status === "submitted" || status === "approved"
          ? `Already ${STATUS_WORDS[status]}.`
          : worst === "caution" && !acknowledged
            ? "Acknowledge the caution flags to submit."
            : null;

  // A refusal names only the fields still wrong, and goes once they are all put right.
  const stillWrong = message?.fields?.filter((field) => field.id in fieldIssues);
  const shown = message && stillWrong?.length !== 0 ? { ...message, fields: stillWrong } : null;

  return (
    <div className="panel flex flex-wrap items-center gap-3 p-3" data-testid="planner-toolbar">
      <div className="mr-auto">
        <h1 className="text-xl" data-testid="setup-name">
          {name}
        </h1>
        <p className="text-sm text-muted">
          <span data-testid="setup-status">{STATUS_WORDS[status]}</span> · version{" "}
          <span className="figure" data-testid="setup-version">
            {version}
          </span>
          {dirty && (
            <span className="ml-2 text-flag-caution" data-testid="unsaved">
              unsaved changes
            </span>
          )}{" "}
          · worst flag <FlagBadge level={worst} />
        </p>
      </div>
      <fieldset className="flex items-center gap-1 text-sm" aria-label="Units">
        {(["metric", "imperial"] as const).map((u) => (
          <button
            key={u}
            type="button"
            aria-pressed={unitSystem === u}
            disabled={units.isPending}
            className={`rounded px-2 py-1 ${unitSystem === u ? "bg-ink text-white" : "border border-hairline bg-white"}`}
            onClick={() => units.mutate(u)}
            data-testid={`units-${u}`}
          >
            {u}
          </button>
        ))}
      </fieldset>
      <button
        type="button"
        onClick={() => {
          if (!refusedForFields("saved")) save.mutate();
        }}
        disabled={save.isPending}
        className="rounded bg-accent px-4 py-1.5 font-medium text-white disabled:opacity-60"
        data-testid="save-setup"
      >
        {save.isPending ? "Saving…" : "Save"}
      </button>
      <div className="flex flex-col items-start">
        {worst === "caution" && !dirty && (status === "draft" || status === "changes_requested") && (
          <label className="flex items-center gap-1 text-xs">
            <input
              type="checkbox"
              checked={acknowledged}
              onChange={(e) => setAcknowledged(e.target.checked)}
              data-testid="acknowledge-cautions"
            />
            I have read the caution flags
          </label>
        )}
        <button
          type="button"
          onClick={() => {
            if (!refusedForFields("submitted")) submit.mutate();
          }}
          disabled={!canSubmit || submit.isPending}
          className="rounded border border-accent px-4 py-1.5 font-medium text-accent disabled:cursor-not-allowed disabled:opacity-50"
          data-testid="submit-setup"
          title={submitHint ?? undefined}
        >
          Submit for review
        </button>
      </div>
      {submitHint && (
        <p className="basis-full text-xs text-muted" data-testid="submit-hint">
          {submitHint}
        </p>
      )}
      {reopensHint && (
        <p className="basis-full text-xs text-flag-caution" data-testid="reopens-hint">
          {reopensHint}
        </p>
      )}
      {shown && (
        <p
          ref={messageRef}
          tabIndex={-1}
          role={shown.kind === "error" ? "alert" : "status"}
          className={`basis-full text-sm ${shown.kind === "error" ? "text-flag-stop" : "text-flag-ok"}`}
          data-testid="save-message"
        >
          {shown.text}
          {shown.fields?.map((field, i) => (
            <span key={field.id}>
              {i > 0 ? "," : ""}{" "}
              <button
                type="button"
                className="underline"
                title={field.message}
                onClick={() => focusField(field.id)}
                data-testid="bad-field"
              >
                {field.label}
              </button>
            </span>
          ))}
          {shown.fields && "."}
          {shown.conflict && (
            <button type="button" className="ml-2 underline" onClick={() => window.location.reload()} data-testid="load-saved-version">
              Load the saved version
            </button>
          )}
        </p>
      )}
    </div>
  );
}
