// A setup's life: its review statuses and the reviewer's outcomes.

export const SETUP_STATUSES = ["draft", "submitted", "changes_requested", "approved"] as const;
export type SetupStatus = (typeof SETUP_STATUSES)[number];

export const DECISION_OUTCOMES = ["approved", "changes_requested"] as const;
export type DecisionOutcome = (typeof DECISION_OUTCOMES)[number];

export const STATUS_WORDS: Record<SetupStatus, string> = {
  draft: "draft",
  submitted: "submitted",
  changes_requested: "changes requested",
  approved: "approved",
};
