import type { UnitSystem } from "@/lib/domain";
import { toDisplay, type Quantity } from "./units";

// The engine words its flags in SI. For a person who reads imperial, the figures in those messages
// are rewritten in place: each number with an SI unit becomes the same quantity in their units.

const NUMBER = String.raw`(-?\d+(?:\.\d+)?)`;

function convert(valueText: string, quantity: Quantity, decimals: number): string {
  return toDisplay(quantity, Number(valueText), "imperial").toFixed(decimals);
}

/** A length reads in inches below a metre and in feet above, as people measure them. */
function lengthText(metresText: string): string {
  const metres = Number(metresText);
  return Math.abs(metres) < 1 ? `${convert(metresText, "smallLength", 1)} in` : `${convert(metresText, "length", 1)} ft`;
}

const RULES: ReadonlyArray<[RegExp, (...groups: string[]) => string]> = [
  // "115 ft³ (3.26 m³)": the message already gives the imperial figure; drop the SI echo.
  [new RegExp(String.raw`(\d+(?:\.\d+)? ft³?) \(${NUMBER} m³?\)`, "g"), (_m, imperial) => imperial],
  [new RegExp(String.raw`${NUMBER} m³`, "g"), (_m, v) => `${convert(v, "volume", 1)} ft³`],
  [new RegExp(String.raw`${NUMBER} m/s`, "g"), (_m, v) => `${convert(v, "speed", 1)} mph`],
  [new RegExp(String.raw`${NUMBER}–${NUMBER} m\b`, "g"), (_m, a, b) => `${convert(a, "length", 2)}–${convert(b, "length", 2)} ft`],
  [new RegExp(String.raw`x = ${NUMBER} m\b`, "g"), (_m, v) => `${convert(v, "length", 2)} ft from the nose`],
  [new RegExp(String.raw`${NUMBER} m\b`, "g"), (_m, v) => lengthText(v)],
  [new RegExp(String.raw`${NUMBER} kg\b`, "g"), (_m, v) => `${convert(v, "mass", 2)} lb`],
  [new RegExp(String.raw`${NUMBER} N\b`, "g"), (_m, v) => `${convert(v, "force", 1)} lbf`],
];

export function flagTextIn(message: string, system: UnitSystem): string {
  if (system === "metric") return message;
  return RULES.reduce((text, [pattern, replace]) => text.replace(pattern, replace as (...args: string[]) => string), message);
}

