import { FLAG_CODES } from "./flags";

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

/**
 * Why a reviewer sends a setup back, counted on the Insight pages: the code of a flag the setup
 * raised, or "other" for a reason the engine does not check.
 */
export const REVIEW_REASON_CODES = [...FLAG_CODES, "other"] as const;
export type ReviewReasonCode = (typeof REVIEW_REASON_CODES)[number];

export const COMMENT_MAX_LENGTH = 4000;
/** A reason to send a setup back is at least a sentence: enough words that the customer can act on it. */
export const SEND_BACK_REASON_MIN_WORDS = 4;

/** How the review queue can be ordered; "waiting" longest first is the oldest submission first. */
export const QUEUE_SORTS = ["submittedAt", "waiting", "freeLiftRatio", "payloadMassKg"] as const;
export type QueueSort = (typeof QUEUE_SORTS)[number];
