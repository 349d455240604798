"use client";
import dynamic from "next/dynamic";
import { useLayoutEffect } from "react";
import { WhenNear } from "@/components/ui/when-near";
import { resolveLimits } from "@/lib/balance";
import { formatFixed, formatQuantity } from "@/lib/units";
import { Cautions } from "./cautions";
import { FigureRow } from "./figure-row";
import { FlagList } from "./flag-list";
import { FreeLiftBar } from "./free-lift-bar";
import { LineFigures } from "./line-figures";
import { usePlanner } from "./planner-context";

function ChartsLoading() {
  // The charts' own height, so nothing below moves when they arrive.
  return (
    <div
      className="panel flex h-[26.875rem] items-center justify-center p-4 text-sm text-muted"
      role="status"
      data-testid="balance-charts-loading"
    >
      Loading the charts…
    </div>
  );
}

// Recharts is the largest library on the page after three.js: it loads after the panel has painted.
const BalanceCharts = dynamic(() => import("./balance-charts").then((module) => module.BalanceCharts), {
  ssr: false,
  loading: () => <ChartsLoading />,
});

const deg = (value: number | null | undefined): string => (value === null || value === undefined ? "none" : `${formatFixed(value, 1)}°`);

/** Everything the engine says about the current draft, live. */
export function BalancePanel() {
  const result = usePlanner((s) => s.result);
  const input = usePlanner((s) => s.input);
  const units = usePlanner((s) => s.unitSystem);
  const lastEditAtMs = usePlanner((s) => s.lastEditAtMs);
  const payloads = usePlanner((s) => s.draft.payloads);

  // Edit-to-panel time, measured by the page: to this commit (the panel's DOM holds the new figures)
  // and to the next animation frame (they are on screen, after the 3D view's own frame).
  useLayoutEffect(() => {
    if (lastEditAtMs <= 0) return;
    performance.measure("trimrail:edit-to-panel", { start: lastEditAtMs, end: performance.now() });
    const frame = requestAnimationFrame(() => {
      performance.measure("trimrail:edit-to-frame", { start: lastEditAtMs, end: performance.now() });
    });
    return () => cancelAnimationFrame(frame);
  }, [lastEditAtMs]);

  const limits = resolveLimits(input.envelope.limits);
  const b = input.envelope.buoyancyCentre;
  const m = result.centreOfMass;
  const dxM = m.x - b.x;
  const direction = Math.abs(dxM) < 0.0005 ? "in line with" : dxM > 0 ? "aft of" : "forward of";

  return (
    <section id="balance" aria-label="Balance" className="space-y-4" data-testid="balance-panel">
      <div className="panel p-4">
        <h2 className="text-lg">Lift</h2>
        <dl className="mt-2">
          <FigureRow label="Gross lift" testId="gross-lift">
            {formatQuantity("mass", result.grossLiftKg, units)}
          </FigureRow>
          <FigureRow label="Total mass" testId="total-mass">
            {formatQuantity("mass", result.totalMassKg, units)}
          </FigureRow>
          <FigureRow label="Free lift" testId="free-lift">
            {formatQuantity("mass", result.freeLiftKg, units)}
          </FigureRow>
          <FigureRow label="Free-lift ratio" testId="free-lift-ratio">
            {formatQuantity("ratio", result.freeLiftRatio, units)}
          </FigureRow>
        </dl>
        <FreeLiftBar ratio={result.freeLiftRatio} cautionRatio={limits.cautionFreeLiftRatio} />
      </div>

      <div className="panel p-4">
        <h2 className="text-lg">Trim</h2>
        <dl className="mt-2">
          <FigureRow label="Centre of mass" testId="com-vs-cob">
            {formatQuantity("smallLength", Math.abs(dxM), units)} {direction} the centre of buoyancy
          </FigureRow>
          <FigureRow label="Calm trim (nose up +)" testId="calm-trim">
            {deg(result.calmTrimDeg)}
          </FigureRow>
          <FigureRow
            label={`Wind ${formatQuantity("speed", result.wind?.speedMS ?? input.site?.windMS ?? 0, units)}: trim`}
            testId="wind-trim"
          >
            {deg(result.wind?.trimDeg)}
          </FigureRow>
          <FigureRow label="Wind: tether angle" testId="wind-tether-angle">
            {deg(result.wind?.tetherAngleDeg)}
          </FigureRow>
          <FigureRow label="Wind: tension">{result.wind ? formatQuantity("force", result.wind.tensionN, units) : "none"}</FigureRow>
          <FigureRow
            label={`Gust ${formatQuantity("speed", result.gust?.speedMS ?? input.site?.gustMS ?? 0, units)}: tether angle`}
            testId="gust-tether-angle"
          >
            {deg(result.gust?.tetherAngleDeg)}
          </FigureRow>
          <FigureRow label="Gust: tension">{result.gust ? formatQuantity("force", result.gust.tensionN, units) : "none"}</FigureRow>
        </dl>
      </div>

      <LineFigures />

      <div className="panel p-4">
        <h2 className="text-lg">Tether and helium</h2>
        <dl className="mt-2">
          <FigureRow label="Most line it lifts in calm" testId="max-tether">
            {result.maxTetherOutM === null ? "none" : formatQuantity("length", result.maxTetherOutM, units, 0)}
          </FigureRow>
          <FigureRow label="Helium to fill" testId="helium-fill">
            {formatQuantity("volume", result.helium.fillVolumeM3, units)}
          </FigureRow>
          <FigureRow label="Cylinders" testId="cylinders">
            {result.helium.cylindersNeeded} × {formatQuantity("volume", result.helium.cylinderContentM3, units, 2)}
          </FigureRow>
          <FigureRow label="Days to a top-up" testId="days-to-top-up">
            {result.helium.daysToTopUp !== null
              ? `${formatFixed(result.helium.daysToTopUp, 1)} days`
              : result.freeLiftRatio < limits.cautionFreeLiftRatio
                ? "due now"
                : "none needed"}
          </FigureRow>
        </dl>
      </div>

      <div className="panel p-4">
        <h2 className="text-lg">Flags</h2>
        <div className="mt-2">
          <FlagList flags={result.flags} unitSystem={units} />
        </div>
      </div>

      {/* The charts sit at the foot of the panel: they load (and run their sweeps) once they come near the screen. */}
      <WhenNear placeholder={<ChartsLoading />}>
        <BalanceCharts />
      </WhenNear>

      <Cautions hasAntenna={payloads.some((p) => p.category === "antenna")} result={result} />
    </section>
  );
}
