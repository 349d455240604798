"use client";
import { worstLevel } from "@/lib/balance";
import { FlagBadge } from "@/components/ui/flag-badge";
import { formatFixed, formatQuantity } from "@/lib/units";
import { FlagList } from "./flag-list";
import { usePlanner } from "./planner-context";

const deg = (value: number | null | undefined): string => (value === null || value === undefined ? "none" : `${formatFixed(value, 1)}°`);

/**
 * The balance at a glance, for narrow screens only: the lift margin, the trim and what the flags say,
 * above the inputs, so that a phone shows the outcome before a long scroll. Wide screens have the
 * balance panel beside the inputs and hide this.
 */
export function BalanceSummary() {
  const result = usePlanner((s) => s.result);
  const units = usePlanner((s) => s.unitSystem);
  const raised = result.flags.filter((f) => f.level !== "ok");
  return (
    <section aria-label="Balance at a glance" className="panel p-3 min-[641px]:hidden" data-testid="balance-summary">
      <div className="flex items-center justify-between gap-2">
        <h2 className="text-base">Balance</h2>
        <FlagBadge level={worstLevel(result.flags)} />
      </div>
      <dl className="mt-1 grid grid-cols-2 gap-x-3 gap-y-0.5 text-sm">
        <dt className="text-muted">Free lift</dt>
        <dd className="figure text-right" data-testid="summary-free-lift">
          {formatQuantity("mass", result.freeLiftKg, units)} ({formatQuantity("ratio", result.freeLiftRatio, units)})
        </dd>
        <dt className="text-muted">Calm trim</dt>
        <dd className="figure text-right" data-testid="summary-calm-trim">
          {deg(result.calmTrimDeg)}
        </dd>
        {result.wind && (
          <>
            <dt className="text-muted">Trim in {formatQuantity("speed", result.wind.speedMS, units)}</dt>
            <dd className="figure text-right">{deg(result.wind.trimDeg)}</dd>
          </>
        )}
      </dl>
      {raised.length > 0 ? (
        <div className="mt-2">
          <FlagList flags={raised} unitSystem={units} testId="summary-flags" />
        </div>
      ) : (
        <p className="mt-2 text-sm">Every flag ok.</p>
      )}
      <a href="#balance" className="mt-2 inline-block text-sm text-accent underline">
        All the figures
      </a>
    </section>
  );
}
