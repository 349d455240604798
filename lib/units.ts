import type { UnitSystem } from "@/lib/domain";
import { CUBIC_FOOT_M3, FOOT_M, INCH_M, INCH_OF_MERCURY_PA, KSI_PA, POUND_FORCE_N, POUND_KG } from "@/lib/balance/units-si";

// Display units only: the engine and the database stay in SI. The exact definitions (1 ft = 0.3048 m,
// 1 lb = 0.45359237 kg, lbf = lb × g0) are the engine's own; here only what a display adds:
// 1 oz = 1/16 lb, 1 mph = 1609.344 m per hour, °F from °C, 1° = π/180 rad, 1 day = 86 400 s.
const OUNCE_KG = POUND_KG / 16;
const MPH_MS = 1609.344 / 3600;
const DEGREE_RAD = Math.PI / 180;
const DAY_S = 86_400;
const celsiusToFahrenheit = (c: number): number => (c * 9) / 5 + 32;
const fahrenheitToCelsius = (f: number): number => ((f - 32) * 5) / 9;

export type Quantity =
  | "mass"
  | "itemMass"
  | "length"
  | "smallLength"
  | "distance"
  | "volume"
  | "speed"
  | "temperature"
  | "temperatureDifference"
  | "force"
  | "massPerLength"
  | "area"
  | "angle"
  | "ratio"
  | "duration"
  // A hull's surface or a sail (m², ft²) and a station pressure (hPa, inHg), for the Workshop.
  | "surfaceArea"
  | "pressure"
  | "stress";

interface UnitDef {
  unit: string;
  /** SI value → display value */
  toDisplay: (si: number) => number;
  /** display value → SI value */
  toSI: (display: number) => number;
  decimals: number;
  /** What stands between the figure and its unit: a space, or nothing for "°". */
  separator: string;
}

const linear = (unit: string, siPerUnit: number, decimals: number, separator = " "): UnitDef => ({
  unit,
  toDisplay: (si) => si / siPerUnit,
  toSI: (d) => d * siPerUnit,
  decimals,
  separator,
});

// Quantities that read the same in both systems: angles in degrees (SI value in radians), ratios
// in percent, durations in days.
const SHARED = {
  angle: linear("°", DEGREE_RAD, 1, ""),
  ratio: linear("%", 0.01, 1),
  duration: linear("days", DAY_S, 1),
} as const;

const UNITS: Record<UnitSystem, Record<Quantity, UnitDef>> = {
  metric: {
    mass: linear("g", 0.001, 0),
    itemMass: linear("g", 0.001, 0),
    length: linear("m", 1, 2),
    smallLength: linear("cm", 0.01, 1),
    // Lengths of line and heights above ground, in whole metres or feet.
    distance: linear("m", 1, 0),
    volume: linear("m³", 1, 3),
    speed: linear("m/s", 1, 1),
    temperature: { unit: "°C", toDisplay: (c) => c, toSI: (c) => c, decimals: 1, separator: " " },
    temperatureDifference: linear("K", 1, 1),
    force: linear("N", 1, 1),
    massPerLength: linear("g/m", 0.001, 2),
    area: linear("cm²", 0.0001, 0),
    surfaceArea: linear("m²", 1, 3),
    pressure: linear("hPa", 100, 1),
    stress: linear("MPa", 1e6, 0),
    ...SHARED,
  },
  imperial: {
    // Lift and totals read in pounds; a single payload item in ounces, as the trade weighs them.
    mass: linear("lb", POUND_KG, 2),
    itemMass: linear("oz", OUNCE_KG, 1),
    length: linear("ft", FOOT_M, 2),
    smallLength: linear("in", INCH_M, 2),
    distance: linear("ft", FOOT_M, 0),
    volume: linear("ft³", CUBIC_FOOT_M3, 2),
    speed: linear("mph", MPH_MS, 1),
    temperature: { unit: "°F", toDisplay: celsiusToFahrenheit, toSI: fahrenheitToCelsius, decimals: 1, separator: " " },
    temperatureDifference: linear("°F", 5 / 9, 1),
    force: linear("lbf", POUND_FORCE_N, 2),
    massPerLength: linear("oz/ft", OUNCE_KG / FOOT_M, 3),
    area: linear("in²", INCH_M ** 2, 1),
    surfaceArea: linear("ft²", FOOT_M ** 2, 2),
    pressure: linear("inHg", INCH_OF_MERCURY_PA, 2),
    stress: linear("ksi", KSI_PA, 1),
    ...SHARED,
  },
};

export function unitOf(quantity: Quantity, system: UnitSystem): string {
  return UNITS[system][quantity].unit;
}

export function toDisplay(quantity: Quantity, si: number, system: UnitSystem): number {
  return UNITS[system][quantity].toDisplay(si);
}

export function fromDisplay(quantity: Quantity, display: number, system: UnitSystem): number {
  return UNITS[system][quantity].toSI(display);
}

export function decimalsOf(quantity: Quantity, system: UnitSystem): number {
  return UNITS[system][quantity].decimals;
}

/**
 * A number with fixed decimals that never reads "-0.0": a value that rounds to zero is shown as
 * zero, whichever side of it it lies.
 */
export function formatFixed(value: number, decimals: number): string {
  const text = value.toFixed(decimals);
  // Only a text that starts with "-" can be a negative zero; parse those alone (this runs often).
  return text.charCodeAt(0) === 45 && Number(text) === 0 ? text.slice(1) : text;
}

/** "1234 g" style text: the figure and its unit. */
export function formatQuantity(quantity: Quantity, si: number, system: UnitSystem, decimals?: number): string {
  const def = UNITS[system][quantity];
  return `${formatFixed(def.toDisplay(si), decimals ?? def.decimals)}${def.separator}${def.unit}`;
}
