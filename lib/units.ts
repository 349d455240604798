import type { UnitSystem } from "@/db/schema";

// Display units only: the engine and the database stay in SI. Exact definitions:
// 1 ft = 0.3048 m, 1 lb = 0.45359237 kg (international yard and pound, 1959), 1 oz = 1/16 lb,
// 1 knot = 1852 m per hour, 1 mph = 1609.344 m per hour, 1 lbf = 4.4482216152605 N (lb × g0).
export const METRES_PER_FOOT = 0.3048;
export const KG_PER_POUND = 0.45359237;
export const KG_PER_OUNCE = KG_PER_POUND / 16;
export const CUBIC_METRES_PER_CUBIC_FOOT = METRES_PER_FOOT ** 3;
export const MS_PER_KNOT = 1852 / 3600;
export const MS_PER_MPH = 1609.344 / 3600;
export const NEWTONS_PER_POUND_FORCE = KG_PER_POUND * 9.80665;

export const feetToMetres = (feet: number): number => feet * METRES_PER_FOOT;
export const metresToFeet = (metres: number): number => metres / METRES_PER_FOOT;
export const poundsToKg = (pounds: number): number => pounds * KG_PER_POUND;
export const kgToPounds = (kg: number): number => kg / KG_PER_POUND;
export const celsiusToFahrenheit = (c: number): number => (c * 9) / 5 + 32;
export const fahrenheitToCelsius = (f: number): number => ((f - 32) * 5) / 9;

export type Quantity = "mass" | "itemMass" | "length" | "smallLength" | "volume" | "speed" | "temperature" | "temperatureDifference" | "force" | "massPerLength" | "area";

interface UnitDef {
  unit: string;
  /** SI value → display value */
  toDisplay: (si: number) => number;
  /** display value → SI value */
  toSI: (display: number) => number;
  decimals: number;
}

const linear = (unit: string, siPerUnit: number, decimals: number): UnitDef => ({
  unit,
  toDisplay: (si) => si / siPerUnit,
  toSI: (d) => d * siPerUnit,
  decimals,
});

const UNITS: Record<UnitSystem, Record<Quantity, UnitDef>> = {
  metric: {
    mass: linear("g", 0.001, 0),
    itemMass: linear("g", 0.001, 0),
    length: linear("m", 1, 2),
    smallLength: linear("cm", 0.01, 1),
    volume: linear("m³", 1, 3),
    speed: linear("m/s", 1, 1),
    temperature: { unit: "°C", toDisplay: (c) => c, toSI: (c) => c, decimals: 1 },
    temperatureDifference: linear("K", 1, 1),
    force: linear("N", 1, 1),
    massPerLength: linear("g/m", 0.001, 2),
    area: linear("cm²", 0.0001, 0),
  },
  imperial: {
    // Lift and totals read in pounds; a single payload item in ounces, as the trade weighs them.
    mass: linear("lb", KG_PER_POUND, 2),
    itemMass: linear("oz", KG_PER_OUNCE, 1),
    length: linear("ft", METRES_PER_FOOT, 2),
    smallLength: linear("in", 0.0254, 2),
    volume: linear("ft³", CUBIC_METRES_PER_CUBIC_FOOT, 2),
    speed: linear("mph", MS_PER_MPH, 1),
    temperature: { unit: "°F", toDisplay: celsiusToFahrenheit, toSI: fahrenheitToCelsius, decimals: 1 },
    temperatureDifference: linear("°F", 5 / 9, 1),
    force: linear("lbf", NEWTONS_PER_POUND_FORCE, 2),
    massPerLength: linear("oz/ft", KG_PER_OUNCE / METRES_PER_FOOT, 3),
    area: linear("in²", 0.0254 ** 2, 1),
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

/** "1 234 g" style text: the figure and its unit. */
export function formatQuantity(quantity: Quantity, si: number, system: UnitSystem, decimals?: number): string {
  const def = UNITS[system][quantity];
  return `${def.toDisplay(si).toFixed(decimals ?? def.decimals)} ${def.unit}`;
}
