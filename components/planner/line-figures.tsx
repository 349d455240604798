"use client";
import type { WindSummary } from "@/lib/balance";
import type { UnitSystem } from "@/lib/domain";
import { formatQuantity } from "@/lib/units";
import { FigureRow } from "./figure-row";
import { usePlanner } from "./planner-context";

/** The line's figures of a case; a result stored before the line was computed has none. */
function lineOf(c: WindSummary | null): NonNullable<WindSummary["line"]> | null {
  return c?.line ?? null;
}

const distance = (m: number, units: UnitSystem) => formatQuantity("distance", m, units);

/** How high and how far downwind the payload flies, from the tether line's own shape. */
export function LineFigures() {
  const result = usePlanner((s) => s.result);
  const units = usePlanner((s) => s.unitSystem);
  const wind = lineOf(result.wind);
  const gust = lineOf(result.gust);
  if (!wind && !gust) return null;
  return (
    <div className="panel p-4" data-testid="line-figures">
      <h2 className="text-lg">The line</h2>
      <dl className="mt-2">
        {wind && (
          <>
            <FigureRow label={`Wind ${formatQuantity("speed", result.wind?.speedMS ?? 0, units)}: payload height`} testId="line-height">
              {distance(wind.heightAboveGroundM, units)}
            </FigureRow>
            <FigureRow label="Wind: downwind of the anchor" testId="line-blowdown">
              {distance(wind.blowdownM, units)}
            </FigureRow>
            <FigureRow label="Wind: line angle at the anchor" testId="line-anchor-angle">
              {wind.anchorAngleDeg.toFixed(1)}°
            </FigureRow>
            <FigureRow label="Wind: tension at the anchor">{formatQuantity("force", wind.anchorTensionN, units)}</FigureRow>
            {result.wind?.windAtLifterMS !== undefined && (
              <FigureRow label="Wind at the lifter's height" testId="wind-at-lifter">
                {formatQuantity("speed", result.wind.windAtLifterMS, units)}
              </FigureRow>
            )}
            {wind.lengthOnGroundM > 0 && (
              <FigureRow label="Wind: line on the ground" testId="line-on-ground">
                {distance(wind.lengthOnGroundM, units)}
              </FigureRow>
            )}
          </>
        )}
        {gust && (
          <>
            <FigureRow
              label={`Gust ${formatQuantity("speed", result.gust?.speedMS ?? 0, units)}: payload height`}
              testId="gust-line-height"
            >
              {distance(gust.heightAboveGroundM, units)}
            </FigureRow>
            <FigureRow label="Gust: downwind of the anchor">{distance(gust.blowdownM, units)}</FigureRow>
          </>
        )}
      </dl>
    </div>
  );
}
