import { describe, expect, it } from "vitest";
import { ROLES, SETUP_STATUSES, WORKFLOW_ACTIONS, nextStatus, type Role, type SetupStatus, type WorkflowAction } from "@/lib/domain";

// The review workflow written out by hand, independent of the table: every move that is allowed,
// as "action from → to, by whom". Everything not listed must be refused.
const ALLOWED: ReadonlyArray<[WorkflowAction, SetupStatus, SetupStatus, "owner" | "reviewer"]> = [
  ["edit", "draft", "draft", "owner"],
  ["edit", "submitted", "draft", "owner"],
  ["edit", "approved", "draft", "owner"],
  ["edit", "changes_requested", "changes_requested", "owner"],
  ["submit", "draft", "submitted", "owner"],
  ["submit", "changes_requested", "submitted", "owner"],
  ["approve", "submitted", "approved", "reviewer"],
  ["request_changes", "submitted", "changes_requested", "reviewer"],
];

const isReviewerRole = (role: Role) => role === "support" || role === "maker";

describe("nextStatus", () => {
  for (const action of WORKFLOW_ACTIONS) {
    for (const from of SETUP_STATUSES) {
      for (const role of ROLES) {
        for (const isOwner of [true, false]) {
          const allowed = ALLOWED.find(
            ([a, f, , by]) => a === action && f === from && (by === "owner" ? isOwner : !isOwner && isReviewerRole(role)),
          );
          const who = `${isOwner ? "the owner" : "another person"} (${role})`;
          it(`returns ${allowed ? `ok → ${allowed[2]}` : "a refusal"} when ${who} takes ${action} from ${from}`, () => {
            const verdict = nextStatus({ action, from, isOwner, role });
            if (allowed) {
              expect(verdict).toEqual({ ok: true, to: allowed[2] });
            } else {
              expect(verdict.ok).toBe(false);
              if (!verdict.ok) expect(verdict.message.length).toBeGreaterThan(10);
            }
          });
        }
      }
    }
  }

  it("returns not_allowed (not wrong_status) when a customer tries to approve a submitted setup", () => {
    expect(nextStatus({ action: "approve", from: "submitted", isOwner: false, role: "customer" })).toMatchObject({
      ok: false,
      reason: "not_allowed",
    });
  });

  it("returns not_allowed when a maker tries to approve their own setup", () => {
    expect(nextStatus({ action: "approve", from: "submitted", isOwner: true, role: "maker" })).toMatchObject({
      ok: false,
      reason: "not_allowed",
    });
  });

  it("returns wrong_status with the status in words when support approves an approved setup", () => {
    const verdict = nextStatus({ action: "approve", from: "approved", isOwner: false, role: "support" });
    expect(verdict).toMatchObject({ ok: false, reason: "wrong_status" });
    if (!verdict.ok) expect(verdict.message).toBe("A setup that is approved cannot be approved.");
  });
});
