/**
 * Helium budget (design.md item 10): the fill volume at the site, cylinders to buy, and days until
 * a top-up. Cylinder content is quoted as free gas at 101 325 Pa and 15 °C; at the site the same
 * gas takes p_std/p · T_gas/T_std times that volume (ideal gas).
 * Loss is modelled as a fixed fraction of the gas per day, so gross lift after d days is
 * G·(1 − f)^d and the free-lift ratio falls below the caution limit c when
 * G·(1 − f)^d·(1 − c) < M, i.e. d = ln(M / (G·(1 − c))) / ln(1 − f).
 *
 * The fraction comes from the fabric's permeability unless one is given: a permeability P in
 * litres of gas at 0 °C and 1 atm per m² per day per atm of partial-pressure difference (the
 * convention of gas-transmission tests, e.g. ASTM D1434 — from memory) lets through
 * P·A·Δp/V_m,0 moles a day across an area A, against p_He·V/(R·T) moles in the envelope; with
 * Δp = p_He (no helium outside) and 1 atm · V_m,0 = R · 273.15 K, the fraction per day is
 *   f = P · A · (T_gas / 273.15 K) / V_fill,   V_fill in litres,
 * whatever the pressure and the purity.
 */
import { STANDARD_ATMOSPHERE_PA, ZERO_CELSIUS_K, cubicFeetToCubicMetres } from "./units-si";

/** Common practice: a "40 cubic foot" balloon-gas cylinder, about 1.13 m³ of free gas. */
export const DEFAULT_CYLINDER_CONTENT_M3 = cubicFeetToCubicMetres(40);
/**
 * Common practice: a few percent of the gas per day through a hand-sewn coated-fabric envelope's
 * seams and valve. For context, published laminate permeabilities are 0.2–0.9 L/(m²·day·atm)
 * (Lv et al., Front. Mater. 2022), i.e. well under 1 %/day for the fabric alone.
 */
export const DEFAULT_LOSS_PER_DAY_FRACTION = 0.03;
const CYLINDER_REFERENCE_TEMPERATURE_K = 288.15;
/**
 * Helium permeability of coated envelope fabric: 0.5 L/(m²·day·atm), inside the 0.2–0.9 range
 * published for laminates (Lv et al., Front. Mater. 2022). Seams and the valve add to it.
 */
export const DEFAULT_PERMEABILITY_L_PER_M2_DAY_ATM = 0.5;
const LITRES_PER_M3 = 1000;

/** Where the day's loss fraction came from: given, from the fabric, or the flat default. */
export type LossSource = "given" | "fabric" | "default";

/** f = P · A · (T_gas / 273.15 K) / V_fill (see above); capped below 1. */
export function permeationLossPerDayFraction(
  permeabilityLPerM2DayAtm: number,
  surfaceAreaM2: number,
  gasTemperatureK: number,
  fillVolumeM3: number,
): number {
  const fraction = (permeabilityLPerM2DayAtm * surfaceAreaM2 * (gasTemperatureK / ZERO_CELSIUS_K)) / (fillVolumeM3 * LITRES_PER_M3);
  return Number.isFinite(fraction) ? Math.min(0.99, Math.max(0, fraction)) : DEFAULT_LOSS_PER_DAY_FRACTION;
}

export interface HeliumBudget {
  /** Gas in the envelope at the site: fill fraction × gas volume. */
  readonly fillVolumeM3: number;
  /** Cylinder content as it expands at the site's pressure and gas temperature. */
  readonly cylinderContentAtSiteM3: number;
  readonly cylinderContentM3: number;
  /** Whole cylinders to fill once. */
  readonly cylindersNeeded: number;
  readonly lossPerDayFraction: number;
  /** Given in the input, from the fabric's permeability, or the flat default (no area known). */
  readonly lossSource: LossSource;
  readonly lossPerDayM3: number;
  /** Gross lift lost on the first day, kg. */
  readonly grossLiftLossPerDayKg: number;
  /** Days until the free-lift ratio falls below the caution limit; null if already below or never. */
  readonly daysToTopUp: number | null;
  /** Gas to put back at that point to restore the fill, m³ (at the site). */
  readonly topUpVolumeM3: number | null;
}

export interface HeliumBudgetInput {
  readonly gasVolumeM3: number;
  readonly fillFraction: number;
  readonly pressurePa: number;
  readonly gasTemperatureK: number;
  readonly cylinderContentM3: number;
  readonly lossPerDayFraction: number;
  readonly lossSource: LossSource;
  readonly grossLiftKg: number;
  readonly totalMassKg: number;
  readonly cautionFreeLiftRatio: number;
}

export function heliumBudget(input: HeliumBudgetInput): HeliumBudget {
  const fillVolumeM3 = input.fillFraction * input.gasVolumeM3;
  const expansion = (STANDARD_ATMOSPHERE_PA / input.pressurePa) * (input.gasTemperatureK / CYLINDER_REFERENCE_TEMPERATURE_K);
  const cylinderContentAtSiteM3 = input.cylinderContentM3 * expansion;
  const f = input.lossPerDayFraction;
  const g = input.grossLiftKg;
  const m = input.totalMassKg;
  const c = input.cautionFreeLiftRatio;
  let daysToTopUp: number | null = null;
  if (f > 0 && g > 0 && m > 0 && c < 1 && (g - m) / g >= c) {
    const days = Math.log(m / (g * (1 - c))) / Math.log(1 - f);
    daysToTopUp = Number.isFinite(days) ? Math.max(0, days) : null;
  }
  return {
    fillVolumeM3,
    cylinderContentAtSiteM3,
    cylinderContentM3: input.cylinderContentM3,
    cylindersNeeded: Math.ceil(fillVolumeM3 / cylinderContentAtSiteM3 - 1e-9),
    lossPerDayFraction: f,
    lossSource: input.lossSource,
    lossPerDayM3: fillVolumeM3 * f,
    grossLiftLossPerDayKg: g * f,
    daysToTopUp,
    topUpVolumeM3: daysToTopUp === null ? null : fillVolumeM3 * (1 - Math.pow(1 - f, daysToTopUp)),
  };
}
