import type { UnitSystem } from "@/lib/domain";
import { formatFixed, formatQuantity } from "@/lib/units";
import type { TrimCase } from "./types";

export const CASE_WORDS: Record<TrimCase, string> = { calm: "Calm", wind: "Wind", gust: "Gust" };

/** The wind arrow's text for the case on show: "Wind 5.0 m/s" or "Gust 8.0 m/s"; none in calm air. */
export function windArrowLabel(trimCase: TrimCase, speedMS: number, units: UnitSystem): string | undefined {
  if (trimCase === "calm" || speedMS <= 0) return undefined;
  return `${CASE_WORDS[trimCase]} ${formatQuantity("speed", speedMS, units)}`;
}

export interface SceneSummaryFacts {
  modelName: string;
  calmTrimDeg: number | null;
  trimCase: TrimCase;
  shownTrimDeg: number;
  /** Why the lifter is drawn on the ground in the case shown ("it does not fly"), or null when it flies. */
  groundedBecause: string | null;
  mountXM: number;
  /** Centre of mass minus centre of buoyancy along the body's x axis (positive: aft). */
  massAftOfBuoyancyM: number;
  units: UnitSystem;
}

function trimWords(deg: number | null): string {
  if (deg === null) return "has no stable trim";
  const magnitude = formatFixed(Math.abs(deg), 1);
  if (magnitude === "0.0") return "trims level";
  return `trims ${magnitude}° ${deg > 0 ? "nose up" : "nose down"}`;
}

/** The 3D view's text alternative: what a sighted person reads off the picture, in words. */
export function sceneSummary(facts: SceneSummaryFacts): string {
  const shown = CASE_WORDS[facts.trimCase].toLowerCase();
  const picture =
    facts.groundedBecause === null
      ? `shown ${shown} case at ${formatFixed(facts.shownTrimDeg, 1)}°`
      : `shown on the ground in the ${shown} case: ${facts.groundedBecause}`;
  const offset = formatQuantity("smallLength", Math.abs(facts.massAftOfBuoyancyM), facts.units);
  const side = facts.massAftOfBuoyancyM >= 0 ? "aft of" : "forward of";
  return (
    `${facts.modelName}: in calm air it ${trimWords(facts.calmTrimDeg)}; ${picture}. ` +
    `Mount ${formatQuantity("length", facts.mountXM, facts.units, 3)} from the nose; centre of mass ${offset} ${side} the centre of buoyancy.`
  );
}
