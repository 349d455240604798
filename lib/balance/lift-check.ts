/**
 * Lift measurements and what they tell (design.md items 2–3 turned around): a gross or free lift
 * weighed at known air and gas gives either the envelope's real gas volume or the gas's purity.
 *
 * Ideal gases at one pressure p (the envelope is slack, so p_gas ≈ p_air):
 *   ρ_air = p / (R_air·T_air)                       (ideal gas law; R_air from ISO 2533)
 *   ρ_gas = P·p/(R_He·T_gas) + (1 − P)·p/(R_air·T_gas),   T_gas = T_air + superheat
 *   gross lift L = fill · V · (ρ_air − ρ_gas)
 * L is linear in V and in the purity P, so either follows from a weighing in closed form:
 *   V = L / (fill · (ρ_air − ρ_gas))
 *   P = (L/(fill·V) − (ρ_air − ρ_air,gas)) / (ρ_air,gas − ρ_He,gas)
 * where ρ_air,gas and ρ_He,gas are air and helium at the gas temperature.
 */
import { airDensityKgM3, siteAir, type AirState } from "./atmosphere";
import { heliumDensityKgM3, liftGasDensityKgM3 } from "./gas";

/** The air and gas a lift was weighed in. A pressure given replaces ISA at the altitude. */
export interface WeighingConditions {
  readonly temperatureC: number;
  readonly altitudeM?: number;
  readonly pressurePa?: number;
  /** Helium fraction of the fill; 1 when not known. */
  readonly purity?: number;
  readonly superheatK?: number;
  readonly fillFraction?: number;
}

function weighingAir(conditions: WeighingConditions): AirState {
  return siteAir({
    altitudeM: conditions.altitudeM ?? 0,
    temperatureC: conditions.temperatureC,
    ...(conditions.pressurePa === undefined ? {} : { pressurePa: conditions.pressurePa }),
  });
}

/** ρ_air − ρ_gas at the weighing, kg/m³: what one cubic metre of the fill lifts. */
export function netLiftPerCubicMetreKg(conditions: WeighingConditions): number {
  const air = weighingAir(conditions);
  const gasTemperatureK = air.temperatureK + (conditions.superheatK ?? 0);
  return air.densityKgM3 - liftGasDensityKgM3(air.pressurePa, gasTemperatureK, conditions.purity ?? 1);
}

/** Gross lift (as a mass) an envelope of this drawn volume should give at the weighing. */
export function predictedGrossLiftKg(gasVolumeM3: number, conditions: WeighingConditions): number {
  return (conditions.fillFraction ?? 1) * gasVolumeM3 * netLiftPerCubicMetreKg(conditions);
}

// ---------------------------------------------------------------- a serial unit's calibration

/**
 * The usual spread of a sewn envelope about its drawing: factors outside it mean a mis-weighing,
 * a leak or a unit cut wrongly, and the maker should look (common practice).
 */
export const CALIBRATION_FACTOR_RANGE = { min: 0.85, max: 1.15 } as const;

export interface LiftTestReading extends WeighingConditions {
  /** Gross lift weighed at full fill, kg. */
  readonly measuredGrossLiftKg: number;
}

/**
 * A unit's calibration factor: measured ÷ predicted gross lift for its model at the test's air and
 * gas. The unit then plans with the model's volume times this factor (the volume it really holds).
 */
export function calibrationFactor(modelGasVolumeM3: number, test: LiftTestReading): number {
  const predicted = predictedGrossLiftKg(modelGasVolumeM3, { ...test, fillFraction: 1, superheatK: 0 });
  return predicted > 0 ? test.measuredGrossLiftKg / predicted : Number.NaN;
}

export function calibrationOutOfRange(factor: number): boolean {
  return !(factor >= CALIBRATION_FACTOR_RANGE.min && factor <= CALIBRATION_FACTOR_RANGE.max);
}

// ---------------------------------------------------------------- the day's lift check

export type LiftCheckUnknownSI = "purity" | "volume";

export interface DayLiftCheckInput {
  /** Free lift weighed at the field (upward pull with the load named below hanging on it), kg. */
  readonly freeLiftKg: number;
  /** Everything that hung on it when weighed (envelope, and the mount and payloads if rigged), kg. */
  readonly weighedMassKg: number;
  readonly temperatureC: number;
  readonly altitudeM?: number;
  readonly pressurePa?: number;
  readonly superheatK?: number;
  readonly fillFraction?: number;
  /** The envelope's gas volume as planned (the model's, or a serial unit's calibrated one). */
  readonly gasVolumeM3: number;
  /** Purity as planned; kept when solving for the volume. */
  readonly purity: number;
  readonly solveFor: LiftCheckUnknownSI;
}

export type DayLiftCheckProblem =
  /** Free lift plus the weighed load is not a lift at all. */
  | "no-gross-lift"
  /** More lift than pure helium gives in the planned volume: the volume is larger, or the weighing is off. */
  | "above-pure-helium"
  /** The implied purity or volume is outside what the engine accepts for a setup. */
  | "out-of-range";

export interface DayLiftCheckResult {
  /** Free lift + weighed load: the gross lift the weighing shows, kg. */
  readonly grossLiftKg: number;
  readonly solvedFor: LiftCheckUnknownSI;
  /** The purity the weighing implies (solving for purity), or the planned one. */
  readonly purity: number;
  /** The gas volume the weighing implies (solving for volume), or the planned one. */
  readonly gasVolumeM3: number;
  /** Null when the result can be used in the setup. */
  readonly problem: DayLiftCheckProblem | null;
}

/** Purity a setup accepts (lib/domain/input-limits.ts): below half helium nobody flies. */
export const LIFT_CHECK_MIN_PURITY = 0.5;

/**
 * The day's lift check: from a free lift weighed at the field, the gas purity (keeping the
 * planned volume) or the gas volume (keeping the planned purity) that explains it.
 */
export function dayLiftCheck(input: DayLiftCheckInput): DayLiftCheckResult {
  const grossLiftKg = input.freeLiftKg + input.weighedMassKg;
  const fill = input.fillFraction ?? 1;
  const planned = { purity: input.purity, gasVolumeM3: input.gasVolumeM3 };
  if (!(grossLiftKg > 0)) return { grossLiftKg, solvedFor: input.solveFor, ...planned, problem: "no-gross-lift" };

  const air = weighingAir(input);
  if (input.solveFor === "volume") {
    const net = netLiftPerCubicMetreKg(input);
    const gasVolumeM3 = grossLiftKg / (fill * net);
    const usable = net > 0 && Number.isFinite(gasVolumeM3);
    return { grossLiftKg, solvedFor: "volume", purity: input.purity, gasVolumeM3, problem: usable ? null : "out-of-range" };
  }

  const gasTemperatureK = air.temperatureK + (input.superheatK ?? 0);
  const airAtGasTemperature = airDensityKgM3(air.pressurePa, gasTemperatureK);
  const heliumAtGasTemperature = heliumDensityKgM3(air.pressurePa, gasTemperatureK);
  const perCubicMetre = grossLiftKg / (fill * input.gasVolumeM3);
  const purity = (perCubicMetre - (air.densityKgM3 - airAtGasTemperature)) / (airAtGasTemperature - heliumAtGasTemperature);
  const problem: DayLiftCheckProblem | null =
    purity > 1 + 1e-9 ? "above-pure-helium" : purity < LIFT_CHECK_MIN_PURITY ? "out-of-range" : null;
  return { grossLiftKg, solvedFor: "purity", purity, gasVolumeM3: input.gasVolumeM3, problem };
}
