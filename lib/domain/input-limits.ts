// The bounds of every number a person types into a setup, in SI, with the words used for it. One
// table: the zod schemas (lib/setups/setup-draft.ts) and the Planner's inputs both read it, so a
// field can never accept in the browser what the server refuses, or the other way round.

export interface InputLimit {
  /** What the field is called in a message. */
  readonly label: string;
  /** SI unit of the stored value ("" for a fraction). */
  readonly unit: string;
  readonly min: number;
  readonly max: number;
}

const limit = (label: string, unit: string, min: number, max: number): InputLimit => ({ label, unit, min, max });

export const INPUT_LIMITS = {
  mountPositionXM: limit("mount position", "m", -5, 60),
  altitudeM: limit("altitude", "m", -500, 6000),
  temperatureC: limit("temperature", "°C", -60, 55),
  pressurePa: limit("pressure", "Pa", 30_000, 110_000),
  windMS: limit("wind", "m/s", 0, 40),
  gustMS: limit("gust", "m/s", 0, 60),
  windMeasuredAtM: limit("wind measured at", "m", 0.5, 200),
  windShearExponent: limit("wind shear exponent", "", 0, 0.6),
  relativeHumidity: limit("relative humidity", "", 0, 1),
  purity: limit("purity", "", 0.5, 1),
  superheatK: limit("superheat", "K", -20, 40),
  fillFraction: limit("fill", "", 0.05, 1),
  tetherMassPerMetreKg: limit("tether mass per metre", "kg/m", 0.00001, 1),
  tetherLengthOutM: limit("tether out", "m", 0, 3000),
  tetherBreakingLoadN: limit("tether breaking load", "N", 1, 1e6),
  tetherDiameterM: limit("tether diameter", "m", 0.0002, 0.02),
  targetHeightM: limit("target height", "m", 1, 3000),
  payloadMassKg: limit("mass", "kg", 0.001, 50),
  payloadSizeM: limit("size", "m", 0.001, 5),
  payloadDragAreaM2: limit("drag area", "m²", 0, 5),
  payloadOffsetXM: limit("offset x", "m", -2, 2),
  payloadOffsetZM: limit("offset z", "m", -5, 1),
  // The day's lift check: a lifter that sinks on the scale reads as a negative free lift.
  liftCheckFreeLiftKg: limit("weighed free lift", "kg", -20, 100),
} as const satisfies Record<string, InputLimit>;

export type InputLimitKey = keyof typeof INPUT_LIMITS;

export const MAX_NAME_LENGTH = 120;
export const MAX_PAYLOADS_PER_SETUP = 12;

/** A new setup's tether when the person first ticks "include the tether": a light braided line, 1.5 mm (common practice). */
export const DEFAULT_TETHER = { massPerMetreKg: 0.0012, lengthOutM: 30, breakingLoadN: 900, diameterM: 0.0015 } as const;

/** Where a new setup's wind is taken as measured, and its shear: WMO-No. 8's 10 m mast, α = 1/7 (common practice). */
export const DEFAULT_WIND_MEASUREMENT = { windMeasuredAtM: 10, windShearExponent: 1 / 7 } as const;
