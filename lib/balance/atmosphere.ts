/**
 * Air at the site: the ICAO/ISO 2533 standard atmosphere (identical to the US Standard Atmosphere
 * 1976 below 32 km), troposphere only (geopotential altitude up to 11 km), with measured
 * temperature or pressure replacing the standard values when given.
 *
 * ISA is defined on geopotential altitude H; a site's altitude above sea level is geometric Z.
 * The conversion is H = r·Z / (r + Z) with r = 6 356 766 m (ISO 2533).
 *
 * Humid air (design.md item 11) is an ideal mixture of dry air and water vapour at the same
 * temperature: ρ = (p − e)/(R_d·T) + e/(R_v·T), with the vapour pressure e = RH · e_s(t) and the
 * saturation vapour pressure over water in the Magnus form of WMO-No. 8 (CIMO Guide), Annex 4.B:
 * e_s = 611.2 Pa · exp(17.62·t / (243.12 + t)), t in °C. Water (18 g/mol) is lighter than dry air
 * (29 g/mol), so humid air is lighter and lifts less. Absent humidity means dry air, as in ISA.
 */
import {
  SPECIFIC_GAS_CONSTANT_AIR_J_PER_KG_K,
  STANDARD_ATMOSPHERE_PA,
  STANDARD_GRAVITY_MS2,
  celsiusToKelvin,
  kelvinToCelsius,
} from "./units-si";

export const ISA_SEA_LEVEL_TEMPERATURE_K = 288.15;
export const ISA_SEA_LEVEL_PRESSURE_PA = STANDARD_ATMOSPHERE_PA;
/** Temperature lapse rate of the ISA troposphere, K per geopotential metre. */
export const ISA_LAPSE_RATE_K_PER_M = -0.0065;
/** Earth radius used by ISO 2533 for the geopotential conversion. */
export const ISA_EARTH_RADIUS_M = 6_356_766;
/** The barometric exponent g0 / (R·|L|) ≈ 5.25588. */
const PRESSURE_EXPONENT = STANDARD_GRAVITY_MS2 / (SPECIFIC_GAS_CONSTANT_AIR_J_PER_KG_K * -ISA_LAPSE_RATE_K_PER_M);

/** Specific gas constant of water vapour, J/(kg·K) (R* / 18.015 g/mol; WMO-No. 8). */
export const SPECIFIC_GAS_CONSTANT_WATER_VAPOUR_J_PER_KG_K = 461.5;

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

/** Saturation vapour pressure over plane water, Pa, Magnus form (WMO-No. 8, Annex 4.B). */
export function saturationVapourPressurePa(temperatureC: number): number {
  return 611.2 * Math.exp((17.62 * temperatureC) / (243.12 + temperatureC));
}

/**
 * Moist air as an ideal mixture: ρ = (p − e)/(R_d·T) + e/(R_v·T), e = RH · e_s(T). The vapour
 * pressure is capped at the total pressure, so a hot, thin, saturated air never gives e > p.
 */
export function moistAirDensityKgM3(pressurePa: number, temperatureK: number, relativeHumidity: number): number {
  if (!(relativeHumidity > 0)) return airDensityKgM3(pressurePa, temperatureK);
  const vapourPa = Math.min(pressurePa, relativeHumidity * saturationVapourPressurePa(kelvinToCelsius(temperatureK)));
  return (
    (pressurePa - vapourPa) / (SPECIFIC_GAS_CONSTANT_AIR_J_PER_KG_K * temperatureK) +
    vapourPa / (SPECIFIC_GAS_CONSTANT_WATER_VAPOUR_J_PER_KG_K * temperatureK)
  );
}

/** ISA at a geopotential altitude (−5 km to 11 km). */
export function isaAtGeopotentialM(geopotentialAltitudeM: number): AirState {
  const temperatureK = ISA_SEA_LEVEL_TEMPERATURE_K + ISA_LAPSE_RATE_K_PER_M * geopotentialAltitudeM;
  const pressurePa = ISA_SEA_LEVEL_PRESSURE_PA * Math.pow(temperatureK / ISA_SEA_LEVEL_TEMPERATURE_K, PRESSURE_EXPONENT);
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
  /** 0–1; absent is dry air, as ISA assumes. */
  readonly relativeHumidity?: number;
}

/**
 * Air at the site: ISA at the geometric altitude, with a measured temperature and/or pressure
 * replacing the standard value (a station pressure, not a sea-level QNH), and the given humidity.
 */
export function siteAir(site: SiteAirInput | undefined): AirState {
  const isa = isaAtGeometricM(site?.altitudeM ?? 0);
  const temperatureK = site?.temperatureC === undefined ? isa.temperatureK : celsiusToKelvin(site.temperatureC);
  const pressurePa = site?.pressurePa ?? isa.pressurePa;
  return { temperatureK, pressurePa, densityKgM3: moistAirDensityKgM3(pressurePa, temperatureK, site?.relativeHumidity ?? 0) };
}
