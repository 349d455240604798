/**
 * Lifting gas and gross lift (design.md items 2–3). Helium is an ideal gas at the gas
 * temperature (air temperature + superheat); an impure fill is helium with the rest air, both at
 * the gas temperature and the site pressure (the envelope is slack-pressure, so p_gas ≈ p_air).
 */
import { airDensityKgM3, siteAir } from "./atmosphere";
import { SPECIFIC_GAS_CONSTANT_HELIUM_J_PER_KG_K } from "./units-si";

/** ρ_He = p / (R_He·T), ideal gas. Real helium is ~0.05 % lighter near room temperature (NIST). */
export function heliumDensityKgM3(pressurePa: number, temperatureK: number): number {
  return pressurePa / (SPECIFIC_GAS_CONSTANT_HELIUM_J_PER_KG_K * temperatureK);
}

/** ρ_gas = purity·ρ_He + (1 − purity)·ρ_air, both at the gas temperature. */
export function liftGasDensityKgM3(pressurePa: number, gasTemperatureK: number, purity: number): number {
  return purity * heliumDensityKgM3(pressurePa, gasTemperatureK) + (1 - purity) * airDensityKgM3(pressurePa, gasTemperatureK);
}

/** Gross lift expressed as a mass: fill fraction · gas volume · (ρ_air − ρ_gas). */
export function grossLiftKg(gasVolumeM3: number, fillFraction: number, airDensityKgM3Value: number, gasDensityKgM3Value: number): number {
  return fillFraction * gasVolumeM3 * (airDensityKgM3Value - gasDensityKgM3Value);
}

export interface LiftMeasurement {
  /** Gross lift weighed at full fill, kg. */
  readonly grossLiftKg: number;
  readonly altitudeM: number;
  readonly temperatureC: number;
  /** Purity of the gas used for the weighing; 1 unless the maker knows otherwise. */
  readonly purity?: number;
}

/**
 * The gas volume a serial unit really holds, from its weighed gross lift: V = L / (ρ_air − ρ_gas)
 * at the weighing's air (ISA pressure at its altitude, its measured temperature, no superheat).
 * Assuming pure helium when the purity is unknown gives the smallest volume consistent with the
 * weighing, so lift planned from it errs low, on the safe side.
 */
export function gasVolumeFromLiftMeasurementM3(measurement: LiftMeasurement): number {
  const air = siteAir({ altitudeM: measurement.altitudeM, temperatureC: measurement.temperatureC });
  const netDensity = air.densityKgM3 - liftGasDensityKgM3(air.pressurePa, air.temperatureK, measurement.purity ?? 1);
  return measurement.grossLiftKg / netDensity;
}
