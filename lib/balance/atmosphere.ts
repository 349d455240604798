/**
 * Air at the site: the ICAO/ISO 2533 standard atmosphere (identical to the US Standard Atmosphere
 * 1976 below 32 km), troposphere only (geopotential altitude up to 11 km), with measured
 * temperature or pressure replacing the standard values when given.
 *
 * ISA is defined on geopotential altitude H; a site's altitude above sea level is geometric Z.
 * The conversion is H = r·Z / (r + Z) with r = 6 356 766 m (ISO 2533).
 */
import {
  SPECIFIC_GAS_CONSTANT_AIR_J_PER_KG_K,
  STANDARD_ATMOSPHERE_PA,
  STANDARD_GRAVITY_MS2,
  celsiusToKelvin,
} from "./units-si";

export const ISA_SEA_LEVEL_TEMPERATURE_K = 288.15;
export const ISA_SEA_LEVEL_PRESSURE_PA = STANDARD_ATMOSPHERE_PA;
/** Temperature lapse rate of the ISA troposphere, K per geopotential metre. */
export const ISA_LAPSE_RATE_K_PER_M = -0.0065;
/** Earth radius used by ISO 2533 for the geopotential conversion. */
export const ISA_EARTH_RADIUS_M = 6_356_766;
/** The barometric exponent g0 / (R·|L|) ≈ 5.25588. */
const PRESSURE_EXPONENT = STANDARD_GRAVITY_MS2 /
  (SPECIFIC_GAS_CONSTANT_AIR_J_PER_KG_K * -ISA_LAPSE_RATE_K_PER_M);

export interface AirState {
  readonly temperatureK: number;
  readonly pressurePa: number;
  readonly densityKgM3: number;
}

export function geopotentialFromGeometricM(geometricAltitudeM: number): number {
  return (ISA_EARTH_RADIUS_M * geometricAltitudeM) / (ISA_EARTH_RADIUS_M + geometricAltitudeM);
}

/** Ideal gas: ρ = p / (R·T). */
export function airDensityKgM3(pressurePa: number, temperatureK: number): number {
  return pressurePa / (SPECIFIC_GAS_CONSTANT_AIR_J_PER_KG_K * temperatureK);
}

/** ISA at a geopotential altitude (−5 km to 11 km). */
export function isaAtGeopotentialM(geopotentialAltitudeM: number): AirState {
  const temperatureK = ISA_SEA_LEVEL_TEMPERATURE_K + ISA_LAPSE_RATE_K_PER_M * geopotentialAltitudeM;
  const pressurePa = ISA_SEA_LEVEL_PRESSURE_PA *
    Math.pow(temperatureK / ISA_SEA_LEVEL_TEMPERATURE_K, PRESSURE_EXPONENT);
  return { temperatureK, pressurePa, densityKgM3: airDensityKgM3(pressurePa, temperatureK) };
}

/** ISA at a geometric altitude above mean sea level (what a map or GPS gives). */
export function isaAtGeometricM(geometricAltitudeM: number): AirState {
  return isaAtGeopotentialM(geopotentialFromGeometricM(geometricAltitudeM));
}

export interface SiteAirInput {
  readonly altitudeM?: number;
  readonly temperatureC?: number;
  readonly pressurePa?: number;
}

/**
 * Air at the site: ISA at the geometric altitude, with a measured temperature and/or pressure
 * replacing the standard value (a station pressure, not a sea-level QNH).
 */
export function siteAir(site: SiteAirInput | undefined): AirState {
  const isa = isaAtGeometricM(site?.altitudeM ?? 0);
  const temperatureK = site?.temperatureC === undefined
    ? isa.temperatureK
    : celsiusToKelvin(site.temperatureC);
  const pressurePa = site?.pressurePa ?? isa.pressurePa;
  return { temperatureK, pressurePa, densityKgM3: airDensityKgM3(pressurePa, temperatureK) };
}
