"use client";
/**
 * The operating envelope as a chart: the tether point's height against the line out, one curve
 * per wind, and at every point its worst flag by shape (circle, triangle, octagon — the flag
 * icons' shapes) and by word in the tooltip and the table beside it; colour only repeats it.
 * Loaded on the client only (next/dynamic in operating-envelope-section.tsx): Recharts stays out
 * of the page's first load.
 */
import { memo } from "react";
import { CartesianGrid, Legend, Line, LineChart, ResponsiveContainer, Tooltip, XAxis, YAxis } from "recharts";
import type { EnvelopePoint, OperatingEnvelope } from "@/lib/balance";
import type { FlagLevel, UnitSystem } from "@/lib/domain";
import { STOP_CAUSES } from "@/lib/flag-messages";
import { formatQuantity, toDisplay, unitOf } from "@/lib/units";

/** Flag colours of look.md (the caution that passes contrast), a second cue after the shape. */
const LEVEL_COLOURS: Record<FlagLevel, string> = { ok: "#2e7d4f", caution: "#8f5b0a", stop: "#b83232" };
/** Curves told apart by dash (and named in the legend), not by colour. */
const DASHES = ["", "6 3", "2 3", "10 4 2 4", "4 4", "1 2"];
const INK_SHADES = ["#14202e", "#176b66", "#3d4a57", "#155f5b", "#5f6670", "#14202e"];

const whole = (value: number): string => String(Math.round(value));

interface ChartRow {
  lineOut: number;
  height: number | null;
  point: EnvelopePoint;
}

/** The point's worst flag as its icon's shape, centred on the point. */
function LevelMark({ cx, cy, level }: { cx: number; cy: number; level: FlagLevel }) {
  const colour = LEVEL_COLOURS[level];
  const r = 4.5;
  if (level === "ok") return <circle cx={cx} cy={cy} r={r} fill="white" stroke={colour} strokeWidth={2} data-level="ok" />;
  if (level === "caution") {
    return <path d={`M${cx} ${cy - r - 1} L${cx + r + 1} ${cy + r} L${cx - r - 1} ${cy + r} Z`} fill={colour} data-level="caution" />;
  }
  const k = r * 0.41;
  const octagon = [
    [-k, -r],
    [k, -r],
    [r, -k],
    [r, k],
    [k, r],
    [-k, r],
    [-r, k],
    [-r, -k],
  ]
    .map(([x, y]) => `${cx + x},${cy + y}`)
    .join(" ");
  return (
    <g data-level="stop">
      <polygon points={octagon} fill={colour} />
      <rect x={cx - r * 0.6} y={cy - 0.8} width={r * 1.2} height={1.6} fill="white" />
    </g>
  );
}

const LEVEL_WORDS: Record<FlagLevel, string> = { ok: "every flag ok", caution: "caution", stop: "stop" };

function pointWords(point: EnvelopePoint, units: UnitSystem): string {
  const where =
    point.heightAboveGroundM === null
      ? "it does not fly"
      : `${formatQuantity("distance", point.heightAboveGroundM, units)} up, ${formatQuantity("distance", point.blowdownM ?? 0, units)} downwind`;
  const worst =
    point.worstLevel === "ok" || !point.worstCode ? LEVEL_WORDS.ok : `${LEVEL_WORDS[point.worstLevel]}: ${STOP_CAUSES[point.worstCode]}`;
  return `${formatQuantity("speed", point.windMS, units)}, ${formatQuantity("distance", point.lineOutM, units)} out: ${where}; ${worst}`;
}

interface OperatingEnvelopeChartProps {
  envelope: OperatingEnvelope;
  unitSystem?: UnitSystem;
}

// Memoised: the section re-renders with every edit, the envelope it is given only once the draft settles.
export const OperatingEnvelopeChart = memo(function OperatingEnvelopeChart({
  envelope,
  unitSystem = "metric",
}: OperatingEnvelopeChartProps) {
  const units = unitSystem;
  const series = envelope.windsMS.map((windMS, i) => ({
    windMS,
    rows: envelope.points[i].map((point): ChartRow => ({
      lineOut: toDisplay("distance", point.lineOutM, units),
      height: point.heightAboveGroundM === null ? null : toDisplay("distance", point.heightAboveGroundM, units),
      point,
    })),
  }));
  const distanceUnit = unitOf("distance", units);
  const counts = { ok: 0, caution: 0, stop: 0 };
  for (const column of envelope.points) for (const p of column) counts[p.worstLevel] += 1;
  const summary =
    `Operating envelope: height against line out for ${envelope.windsMS.length} winds; ` +
    `${counts.ok} points with every flag ok, ${counts.caution} with a caution, ${counts.stop} with a stop.`;

  return (
    <figure className="space-y-2" data-testid="envelope-chart">
      <figcaption className="text-sm font-medium">
        Height of the tether point ({distanceUnit}) against line out ({distanceUnit}), one curve per wind as measured
      </figcaption>
      <div className="h-72" role="img" aria-label={summary}>
        <ResponsiveContainer width="100%" height="100%">
          <LineChart margin={{ top: 8, right: 16, bottom: 4, left: -8 }}>
            <CartesianGrid stroke="#e6e2d9" />
            <XAxis
              dataKey="lineOut"
              type="number"
              domain={[0, "auto"]}
              allowDecimals={false}
              tick={{ fontSize: 11 }}
              tickFormatter={whole}
              allowDuplicatedCategory={false}
            />
            <YAxis type="number" domain={[0, "auto"]} allowDecimals={false} tick={{ fontSize: 11 }} tickFormatter={whole} />
            {/* In the order of the winds, not sorted as text. */}
            <Legend iconType="plainline" itemSorter={null} wrapperStyle={{ fontSize: 11 }} />
            <Tooltip
              content={({ active, payload }) => {
                const row = active ? (payload?.[0]?.payload as ChartRow | undefined) : undefined;
                return row ? <div className="panel max-w-xs p-2 text-xs">{pointWords(row.point, units)}</div> : null;
              }}
            />
            {series.map((s, i) => (
              <Line
                key={s.windMS}
                data={s.rows}
                dataKey="height"
                name={formatQuantity("speed", s.windMS, units)}
                stroke={INK_SHADES[i % INK_SHADES.length]}
                strokeDasharray={DASHES[i % DASHES.length]}
                strokeWidth={1.4}
                isAnimationActive={false}
                connectNulls={false}
                dot={({ cx, cy, payload, index }) =>
                  typeof cx === "number" && typeof cy === "number" && (payload as ChartRow).height !== null ? (
                    <LevelMark key={`${s.windMS}-${index}`} cx={cx} cy={cy} level={(payload as ChartRow).point.worstLevel} />
                  ) : (
                    <g key={`${s.windMS}-${index}`} />
                  )
                }
              />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
      <ul className="flex flex-wrap gap-4 text-xs" aria-label="What the marks mean">
        {(["ok", "caution", "stop"] as const).map((level) => (
          <li key={level} className="flex items-center gap-1">
            <svg width="14" height="14" viewBox="0 0 14 14" aria-hidden="true">
              <LevelMark cx={7} cy={7} level={level} />
            </svg>
            <span>{level === "ok" ? "every flag ok" : `worst flag ${level}`}</span>
          </li>
        ))}
      </ul>
      <details className="text-xs" data-testid="envelope-table">
        <summary className="cursor-pointer text-sm">The envelope as a table</summary>
        <table className="mt-2 w-full border-collapse">
          <thead>
            <tr>
              <th className="text-left font-medium">Line out</th>
              {envelope.windsMS.map((w) => (
                <th key={w} className="text-right font-medium">
                  {formatQuantity("speed", w, units)}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {envelope.linesOutM.map((lineOutM, j) => (
              <tr key={lineOutM} className="border-t border-hairline">
                <td className="figure">{formatQuantity("distance", lineOutM, units)}</td>
                {envelope.points.map((column, i) => {
                  const p = column[j];
                  return (
                    <td key={envelope.windsMS[i]} className="figure text-right" title={pointWords(p, units)} data-level={p.worstLevel}>
                      {p.heightAboveGroundM === null ? "—" : formatQuantity("distance", p.heightAboveGroundM, units)} {p.worstLevel}
                    </td>
                  );
                })}
              </tr>
            ))}
          </tbody>
        </table>
      </details>
    </figure>
  );
});

export default OperatingEnvelopeChart;
