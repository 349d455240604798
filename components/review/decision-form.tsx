"use client";
import { useMutation } from "@tanstack/react-query";
import { useRouter } from "next/navigation";
import { useId, useState } from "react";
import { decideRequest } from "@/lib/client/api";
import { SEND_BACK_REASON_MIN_WORDS, type DecisionOutcome, type FlagLevel, type ReviewReasonCode } from "@/lib/domain";

interface DecisionFormProps {
  setupId: string;
  version: number;
  /** The flags the setup raised beyond `ok`, offered as reasons. */
  raised: { code: ReviewReasonCode; level: FlagLevel; text: string }[];
}

const words = (text: string) => text.split(/\s+/).filter(Boolean).length;

/** Approve, or send back with a reason: the reviewer's one decision on this version of the setup. */
export function DecisionForm({ setupId, version, raised }: DecisionFormProps) {
  const router = useRouter();
  const id = useId();
  const [decision, setDecision] = useState<DecisionOutcome>("approved");
  const [reason, setReason] = useState("");
  const [codes, setCodes] = useState<ReviewReasonCode[]>(raised.map((r) => r.code));
  const [tried, setTried] = useState(false);
  const decide = useMutation({
    mutationFn: () =>
      decideRequest(setupId, { decision, reason: reason.trim(), reasonCodes: decision === "changes_requested" ? codes : [], version }),
    onSuccess: () => router.refresh(),
  });
  const reasonMissing = decision === "changes_requested" && words(reason) < SEND_BACK_REASON_MIN_WORDS;
  const reasonError = tried && reasonMissing ? "Say what should change, in at least a sentence." : null;

  return (
    <form
      className="panel space-y-3 p-4"
      aria-labelledby={`${id}-title`}
      data-testid="decision-form"
      onSubmit={(e) => {
        e.preventDefault();
        setTried(true);
        if (!reasonMissing) decide.mutate();
      }}
    >
      <h2 id={`${id}-title`} className="text-lg">
        Decision on version {version}
      </h2>
      <fieldset className="space-y-1 text-sm">
        <legend className="sr-only">Decision</legend>
        <label className="flex items-center gap-2">
          <input
            type="radio"
            name="decision"
            value="approved"
            checked={decision === "approved"}
            onChange={() => setDecision("approved")}
            data-testid="decision-approve"
          />
          Approve for first flight
        </label>
        <label className="flex items-center gap-2">
          <input
            type="radio"
            name="decision"
            value="changes_requested"
            checked={decision === "changes_requested"}
            onChange={() => setDecision("changes_requested")}
            data-testid="decision-send-back"
          />
          Send back for changes
        </label>
      </fieldset>
      {decision === "changes_requested" && raised.length > 0 && (
        <fieldset className="text-sm">
          <legend className="text-muted">What it is about</legend>
          {[...raised, { code: "other" as const, level: "ok" as const, text: "something the flags do not cover" }].map((r) => (
            <label key={r.code} className="mt-1 flex items-start gap-2">
              <input
                type="checkbox"
                checked={codes.includes(r.code)}
                onChange={(e) => setCodes(e.target.checked ? [...codes, r.code] : codes.filter((c) => c !== r.code))}
              />
              <span>{r.text}</span>
            </label>
          ))}
        </fieldset>
      )}
      <div>
        <label htmlFor={`${id}-reason`} className="block text-sm text-muted">
          {decision === "changes_requested" ? "What should change (the customer reads this)" : "Note for the customer (optional)"}
        </label>
        <textarea
          id={`${id}-reason`}
          rows={4}
          value={reason}
          onChange={(e) => setReason(e.target.value)}
          className="mt-0.5 w-full rounded border border-hairline bg-white px-2 py-1 text-sm"
          aria-invalid={reasonError ? true : undefined}
          aria-describedby={reasonError ? `${id}-reason-error` : undefined}
          data-testid="decision-reason"
        />
        {reasonError && (
          <p id={`${id}-reason-error`} className="text-sm text-flag-stop">
            {reasonError}
          </p>
        )}
      </div>
      <button
        type="submit"
        disabled={decide.isPending}
        className="rounded bg-accent px-3 py-1.5 text-sm font-medium text-white disabled:opacity-60"
        data-testid="decision-submit"
      >
        {decision === "approved" ? "Approve" : "Send back"}
      </button>
      {decide.error && (
        <p role="alert" className="text-sm text-flag-stop">
          {decide.error.message}
        </p>
      )}
    </form>
  );
}
