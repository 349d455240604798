"use client";
import dynamic from "next/dynamic";
import { useDeferredValue, useMemo } from "react";
import { operatingEnvelope, type OperatingEnvelope } from "@/lib/balance";
import { INPUT_LIMITS as L, type UnitSystem } from "@/lib/domain";
import { WhenNear } from "@/components/ui/when-near";
import { formatQuantity } from "@/lib/units";
import { usePlanner, usePlannerActions } from "./planner-context";
import { useSettledValue } from "./use-settled-value";
import { QuantityInput } from "./quantity-input";
import { Section } from "./section";

// Recharts loads with the chart, after the page: not in the Planner's first load.
function ChartLoading() {
  return (
    <p role="status" className="h-72 text-sm text-muted">
      Loading the chart…
    </p>
  );
}

const OperatingEnvelopeChart = dynamic(() => import("./operating-envelope-chart").then((m) => m.OperatingEnvelopeChart), {
  ssr: false,
  loading: () => <ChartLoading />,
});

/** The chart's grid: winds 0–15 m/s every 3 m/s (six curves stay readable), twelve line-outs. */
const CHART_OPTIONS = { windCount: 6, lineCount: 12 } as const;

const REASONS: Record<NonNullable<OperatingEnvelope["reason"]>, string> = {
  "no-tether": "Include the tether line to see where this setup can fly.",
  "no-free-lift": "Without free lift it does not fly at any wind or line out.",
  "too-little-line": "It cannot lift even the shortest line of the envelope in calm air.",
};

function windWords(windMS: number | null, maxMS: number, units: UnitSystem, none: string): string {
  if (windMS === null) return none;
  return windMS >= maxMS ? `at every wind to ${formatQuantity("speed", maxMS, units)}` : `up to ${formatQuantity("speed", windMS, units)}`;
}

/**
 * Where the setup can fly: the operating envelope's chart, the winds it stays ok in at its own
 * line out, and the line out for a target height in its wind.
 */
export function OperatingEnvelopeSection() {
  const liveInput = usePlanner((s) => s.input);
  const targetHeightM = usePlanner((s) => s.draft.targetHeightM);
  const units = usePlanner((s) => s.unitSystem);
  const readOnly = usePlanner((s) => s.readOnly ?? false);
  const { setTargetHeight } = usePlannerActions();
  // Over a hundred evaluations and a chart: they follow the draft once it settles (see
  // useSettledValue), then still let the page paint first.
  const input = useDeferredValue(useSettledValue(liveInput));
  const envelope = useMemo(
    () => operatingEnvelope(input, { ...CHART_OPTIONS, ...(targetHeightM === null ? {} : { targetHeightM }) }),
    [input, targetHeightM],
  );
  const maxWindMS = envelope.windsMS[envelope.windsMS.length - 1] ?? 0;
  const target = envelope.target;

  return (
    <Section title="Operating envelope" testId="section-envelope">
      {envelope.reason ? (
        <p className="text-sm" data-testid="envelope-reason">
          {REASONS[envelope.reason]}
        </p>
      ) : (
        <div className="space-y-3">
          <dl className="grid gap-1 text-sm sm:grid-cols-2">
            <div>
              <dt className="text-muted">Every flag ok at {formatQuantity("distance", envelope.lineOutM ?? 0, units)} out</dt>
              <dd className="figure" data-testid="envelope-all-ok">
                {windWords(envelope.highestAllOkWindMS, maxWindMS, units, "not even in calm air")}
              </dd>
            </div>
            <div>
              <dt className="text-muted">No stop flag at that line out</dt>
              <dd className="figure" data-testid="envelope-no-stop">
                {windWords(envelope.highestWithoutStopWindMS, maxWindMS, units, "not even in calm air")}
              </dd>
            </div>
          </dl>
          <div className="flex flex-wrap items-end gap-3">
            <QuantityInput
              label="Target height of the payload"
              quantity="distance"
              valueSI={targetHeightM}
              unitSystem={units}
              minSI={L.targetHeightM.min}
              maxSI={L.targetHeightM.max}
              optional
              placeholder="none"
              disabled={readOnly}
              onCommit={setTargetHeight}
              testId="target-height-input"
            />
            {target && (
              <p className="text-sm" data-testid="envelope-target">
                {target.lineOutM === null
                  ? `No line it can lift reaches ${formatQuantity("distance", target.heightM, units)} in ${formatQuantity("speed", target.windMS, units)}.`
                  : `In ${formatQuantity("speed", target.windMS, units)}, ${formatQuantity("distance", target.lineOutM, units)} of line out puts the tether point ${formatQuantity("distance", target.heightM, units)} up.`}
              </p>
            )}
          </div>
          <WhenNear placeholder={<ChartLoading />}>
            <OperatingEnvelopeChart envelope={envelope} unitSystem={units} />
          </WhenNear>
          <p className="text-xs text-muted">
            Gusts at each point keep this setup&apos;s gust-to-wind ratio. Heights are of the tether point above the anchor, from the
            line&apos;s own weight and drag; planning estimates only.
          </p>
        </div>
      )}
    </Section>
  );
}
