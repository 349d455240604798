import type { ThreadItem } from "@/db/queries/review";
import type { SetupStatus } from "@/lib/domain";

const WHEN = new Intl.DateTimeFormat("en-GB", { dateStyle: "medium", timeZone: "UTC" });

/** The latest review decision, at the top of the customer's Planner, with the reviewer's reason. */
export function DecisionBanner({ decision, status }: { decision: ThreadItem | null; status: SetupStatus }) {
  if (!decision || decision.kind !== "decision") return null;
  const approved = decision.decision === "approved";
  const stillStands = (approved && status === "approved") || (!approved && status === "changes_requested");
  return (
    <section
      className={`panel border-l-4 p-4 ${approved ? "border-l-flag-ok" : "border-l-flag-caution"}`}
      aria-labelledby="decision-title"
      data-testid="decision-banner"
      data-decision={decision.decision}
    >
      <h2 id="decision-title" className="text-lg">
        {approved ? "Approved for first flight" : "Changes requested"}
        {!stillStands && <span className="ml-2 text-sm font-normal text-muted">(on an earlier version; you have changed it since)</span>}
      </h2>
      <p className="text-sm text-muted">
        {decision.authorName}, {WHEN.format(decision.at)}, on version {decision.setupVersion}
      </p>
      {decision.body && (
        <p className="mt-2 whitespace-pre-wrap" data-testid="decision-reason-text">
          {decision.body}
        </p>
      )}
      {!approved && stillStands && (
        <p className="mt-2 text-sm">Change the setup below, save, and submit it again. Reply in the discussion if something is unclear.</p>
      )}
    </section>
  );
}
