import type { Role } from "./roles";
import type { SetupStatus } from "./setups";

// The review workflow as one table: which action moves a setup from which status to which, and who
// may take it. Every write that changes a status asks `nextStatus` inside its transaction.
//
//   draft ──submit──▶ submitted ──approve──▶ approved
//     ▲                  │  ▲                   │
//     │         request changes  submit         │
//     │                  ▼  │                   │
//     └──── edit ── changes_requested            │
//   an edit of a submitted or approved setup takes it back to draft (it needs a new review)

export const WORKFLOW_ACTIONS = ["edit", "submit", "approve", "request_changes"] as const;
export type WorkflowAction = (typeof WORKFLOW_ACTIONS)[number];

/** Who takes an action: the setup's owner, or review staff (support or maker) who do not own it. */
export type Actor = "owner" | "reviewer";

interface Rule {
  readonly actor: Actor;
  readonly from: Partial<Record<SetupStatus, SetupStatus>>;
}

export const WORKFLOW: Readonly<Record<WorkflowAction, Rule>> = {
  edit: { actor: "owner", from: { draft: "draft", submitted: "draft", approved: "draft", changes_requested: "changes_requested" } },
  submit: { actor: "owner", from: { draft: "submitted", changes_requested: "submitted" } },
  approve: { actor: "reviewer", from: { submitted: "approved" } },
  request_changes: { actor: "reviewer", from: { submitted: "changes_requested" } },
};

export const REVIEWER_ROLES: readonly Role[] = ["support", "maker"];

export type TransitionVerdict = { ok: true; to: SetupStatus } | { ok: false; reason: "not_allowed" | "wrong_status"; message: string };

const WORDS: Record<SetupStatus, string> = {
  draft: "a draft",
  submitted: "submitted",
  changes_requested: "sent back for changes",
  approved: "approved",
};

/**
 * The status an action leads to, or why it may not be taken: by this person (their relation to the
 * setup and their role) from this status.
 */
export function nextStatus({
  action,
  from,
  isOwner,
  role,
}: {
  action: WorkflowAction;
  from: SetupStatus;
  isOwner: boolean;
  role: Role;
}): TransitionVerdict {
  const rule = WORKFLOW[action];
  if (rule.actor === "owner" && !isOwner) return { ok: false, reason: "not_allowed", message: "Only the setup's owner can do that." };
  if (rule.actor === "reviewer") {
    if (!REVIEWER_ROLES.includes(role))
      return { ok: false, reason: "not_allowed", message: "Only support staff or the maker can decide on a setup." };
    if (isOwner) return { ok: false, reason: "not_allowed", message: "A setup is reviewed by someone other than its owner." };
  }
  const to = rule.from[from];
  if (!to) {
    const verb =
      action === "request_changes" ? "sent back" : action === "approve" ? "approved" : action === "submit" ? "submitted" : "edited";
    return { ok: false, reason: "wrong_status", message: `A setup that is ${WORDS[from]} cannot be ${verb}.` };
  }
  return { ok: true, to };
}
