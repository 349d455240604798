"use client";
import { memo, useDeferredValue, useMemo } from "react";
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import { evaluateBalance, resolveLimits, type BalanceInput } from "@/lib/balance";
import type { UnitSystem } from "@/lib/domain";
import { toDisplay, unitOf } from "@/lib/units";
import { usePlanner } from "./planner-context";
import { useSettledValue } from "./use-settled-value";

const WIND_POINTS = 31;
const WIND_MAX_MS = 15;
const ALTITUDE_POINTS = 25;
const ALTITUDE_MAX_M = 3000;

function windSweep(input: BalanceInput, units: UnitSystem) {
  const rows: { speed: number; angle: number | null }[] = [];
  for (let i = 0; i < WIND_POINTS; i++) {
    const windMS = (WIND_MAX_MS * i) / (WIND_POINTS - 1);
    const r = evaluateBalance({ ...input, site: { ...input.site, windMS, gustMS: undefined } });
    rows.push({
      speed: Number(toDisplay("speed", windMS, units).toFixed(1)),
      angle: r.wind ? Number(r.wind.tetherAngleDeg.toFixed(1)) : null,
    });
  }
  return rows;
}

function altitudeSweep(input: BalanceInput, units: UnitSystem) {
  const rows: { altitude: number; freeLift: number }[] = [];
  for (let i = 0; i < ALTITUDE_POINTS; i++) {
    const altitudeM = (ALTITUDE_MAX_M * i) / (ALTITUDE_POINTS - 1);
    // Standard atmosphere at each altitude: the site's own temperature and pressure belong to one place.
    const r = evaluateBalance({ ...input, site: { altitudeM, windMS: 0 } });
    rows.push({
      altitude: Math.round(toDisplay("length", altitudeM, units)),
      freeLift: Number(toDisplay("mass", r.freeLiftKg, units).toFixed(units === "metric" ? 0 : 2)),
    });
  }
  return rows;
}

/** Two small charts of this setup: tether angle against wind speed, free lift against altitude. */
export function BalanceCharts() {
  const liveInput = usePlanner((s) => s.input);
  const units = usePlanner((s) => s.unitSystem);
  // The sweeps run a few dozen evaluations and redraw two charts: they follow the draft once it
  // settles, so a drag moves at the pointer's pace, and then still let the page paint first.
  const input = useDeferredValue(useSettledValue(liveInput));
  return <SettledCharts input={input} units={units} />;
}

/** Memoised: while the draft moves, the settled input stays the same and the charts are not redrawn. */
const SettledCharts = memo(function SettledCharts({ input, units }: { input: BalanceInput; units: UnitSystem }) {
  const wind = useMemo(() => windSweep(input, units), [input, units]);
  const altitude = useMemo(() => altitudeSweep(input, units), [input, units]);
  const cautionDeg = resolveLimits(input.envelope.limits).cautionTetherAngleDeg;

  return (
    <div className="panel space-y-4 p-4" data-testid="balance-charts">
      <figure>
        <figcaption className="text-sm font-medium">Tether angle from vertical vs wind ({unitOf("speed", units)})</figcaption>
        <div className="h-40">
          <ResponsiveContainer width="100%" height="100%">
            <LineChart data={wind} margin={{ top: 8, right: 8, bottom: 0, left: -16 }}>
              <CartesianGrid stroke="#e6e2d9" />
              <XAxis dataKey="speed" type="number" domain={[0, "dataMax"]} tick={{ fontSize: 11 }} />
              <YAxis domain={[0, 90]} ticks={[0, 30, 45, 60, 90]} tick={{ fontSize: 11 }} unit="°" />
              <ReferenceLine y={cautionDeg} stroke="#8f5b0a" strokeDasharray="4 3" />
              <Tooltip formatter={(v) => [`${v}°`, "tether angle"]} labelFormatter={(l) => `${l} ${unitOf("speed", units)}`} />
              <Line type="monotone" dataKey="angle" stroke="#1d7f7a" dot={false} isAnimationActive={false} connectNulls={false} />
            </LineChart>
          </ResponsiveContainer>
        </div>
      </figure>
      <figure>
        <figcaption className="text-sm font-medium">
          Free lift ({unitOf("mass", units)}) vs site altitude ({unitOf("length", units)}), standard atmosphere
        </figcaption>
        <div className="h-40">
          <ResponsiveContainer width="100%" height="100%">
            <LineChart data={altitude} margin={{ top: 8, right: 8, bottom: 0, left: -8 }}>
              <CartesianGrid stroke="#e6e2d9" />
              <XAxis dataKey="altitude" type="number" domain={[0, "dataMax"]} tick={{ fontSize: 11 }} />
              <YAxis tick={{ fontSize: 11 }} />
              <ReferenceLine y={0} stroke="#b83232" />
              <Tooltip
                formatter={(v) => [`${v} ${unitOf("mass", units)}`, "free lift"]}
                labelFormatter={(l) => `${l} ${unitOf("length", units)}`}
              />
              <Line type="monotone" dataKey="freeLift" stroke="#1d7f7a" dot={false} isAnimationActive={false} />
            </LineChart>
          </ResponsiveContainer>
        </div>
      </figure>
    </div>
  );
});
