import type { UnitSystem } from "@/lib/domain";
import { formatQuantity } from "@/lib/units";
import type { TrimCase } from "./types";

export const CASE_WORDS: Record<TrimCase, string> = { calm: "Calm", wind: "Wind", gust: "Gust" };

/** The wind arrow's text for the case on show: "Wind 5.0 m/s" or "Gust 8.0 m/s"; none in calm air. */
export function windArrowLabel(trimCase: TrimCase, speedMS: number, units: UnitSystem): string | undefined {
  if (trimCase === "calm" || speedMS <= 0) return undefined;
  return `${CASE_WORDS[trimCase]} ${formatQuantity("speed", speedMS, units)}`;
}
