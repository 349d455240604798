/**
 * The balance engine's input contract. Every number must be finite (zod 4 rejects NaN and
 * ±Infinity for z.number()) and within physical bounds; messages name the quantity and unit.
 * No defaults are applied here: evaluateBalance applies them, so parsing is not needed on the
 * hot path (the planner calls the engine on every drag) and input equals parsed output.
 */
import { z } from "zod";
import { hullParamsSchema } from "./geometry";

const quantity = (label: string, min: number, max: number) =>
  z.number(`${label} must be a finite number`).min(min, `${label} must be at least ${min}`).max(max, `${label} must be at most ${max}`);

const positive = (label: string, max: number) =>
  z.number(`${label} must be a finite number`).gt(0, `${label} must be greater than 0`).max(max, `${label} must be at most ${max}`);

/** Error for a missing or malformed section, e.g. "envelope is required". */
const section = (label: string) => ({
  error: (issue: { input?: unknown }) => (issue.input === undefined ? `${label} is required` : `${label} must be an object`),
});

/** Body-frame coordinates are limited to ±1 km: nothing on a lifter is further from its nose. */
const coordinateM = (label: string) => quantity(`${label} (m)`, -1000, 1000);

export const vecSchema = z.object(
  {
    x: coordinateM("x"),
    z: coordinateM("z"),
  },
  section("point {x, z}"),
);

export const THREADS = ["1/4-20 UNC", "3/8-16 UNC"] as const;
export const threadSchema = z.enum(THREADS, 'thread must be "1/4-20 UNC" or "3/8-16 UNC"');
export const attachmentSchema = z.enum([...THREADS, "strap"], 'attachment must be "1/4-20 UNC", "3/8-16 UNC" or "strap"');

export const limitsSchema = z.object({
  cautionFreeLiftRatio: quantity("caution free-lift ratio", 0, 1).optional(),
  cautionTrimDeg: quantity("caution trim (deg)", 0, 90).optional(),
  stopTrimDeg: quantity("stop trim (deg)", 0, 90).optional(),
  cautionTetherAngleDeg: quantity("caution tether angle (deg)", 0, 90).optional(),
  stopTetherAngleDeg: quantity("stop tether angle (deg)", 0, 90).optional(),
  loadFactor: quantity("load factor", 1, 100).optional(),
  mountCautionFraction: quantity("mount caution fraction", 0, 1).optional(),
  safetyLineFactor: quantity("safety-line factor", 1, 1000).optional(),
  tetherSafetyFactor: quantity("tether safety factor", 1, 1000).optional(),
  clearanceCautionM: quantity("caution clearance (m)", 0, 10).optional(),
  screwProofStrengthPa: positive("screw proof strength (Pa)", 5e9).optional(),
});

export const aeroSchema = z.object({
  sailAreaM2: quantity("sail area (m²)", 0, 10_000),
  liftSlopePerRad: quantity("lift slope (per rad)", 0, 10),
  zeroLiftTrimDeg: quantity("zero-lift trim (deg)", -45, 45),
  dragCoefficient: quantity("drag coefficient", 0, 5),
  pressureCentre: vecSchema,
  /** Span²/area of the sail; when given, the sail's induced drag CL²/(π·e·AR) is added. */
  aspectRatio: positive("aspect ratio", 100).optional(),
  /** e of the induced drag; absent = DEFAULT_SPAN_EFFICIENCY (wind.ts). */
  spanEfficiency: positive("span efficiency", 1).optional(),
});

export const envelopeSchema = z.object(
  {
    gasVolumeM3: positive("gas volume (m³)", 100_000),
    massKg: quantity("envelope mass (kg)", 0, 100_000),
    buoyancyCentre: vecSchema,
    massCentre: vecSchema,
    tetherPoint: vecSchema,
    rail: z
      .object(
        {
          startX: coordinateM("rail start x"),
          endX: coordinateM("rail end x"),
          z: coordinateM("rail z"),
        },
        section("rail"),
      )
      .refine((rail) => rail.endX >= rail.startX, {
        message: "rail end x must not be forward of rail start x",
        path: ["endX"],
      }),
    aero: aeroSchema.optional(),
    limits: limitsSchema.optional(),
    /** The hull's shape, for the clearance check against the hull. */
    hull: hullParamsSchema.optional(),
    /**
     * Helium the fabric lets through, litres (0 °C, 1 atm) per m² per day per atm of helium; absent =
     * DEFAULT_PERMEABILITY_L_PER_M2_DAY_ATM (helium.ts). Used unless gas.lossPerDayFraction is given.
     */
    permeabilityLPerM2DayAtm: quantity("fabric permeability (L/(m²·day·atm))", 0, 1000).optional(),
    /** The gas-holding skin's area; absent = the hull's own (geometry.ts) when the hull is given. */
    surfaceAreaM2: positive("envelope surface area (m²)", 1e6).optional(),
  },
  section("envelope"),
);

export const gasSchema = z.object({
  purity: quantity("helium purity (fraction)", 0, 1).optional(),
  superheatK: quantity("superheat (K)", -30, 80).optional(),
  fillFraction: z
    .number("fill fraction must be a finite number")
    .gt(0, "fill fraction must be greater than 0")
    .max(1, "fill fraction must be at most 1")
    .optional(),
  /** Gas one cylinder delivers, referred to 101 325 Pa and 15 °C. */
  cylinderContentM3: positive("cylinder content (m³)", 1000).optional(),
  /** Fraction of the gas lost per day through the fabric and seams. */
  lossPerDayFraction: quantity("loss per day (fraction)", 0, 0.99).optional(),
});

export const siteSchema = z.object({
  /** Geometric altitude above mean sea level. */
  altitudeM: quantity("altitude (m)", -500, 11_000).optional(),
  temperatureC: quantity("temperature (°C)", -80, 60).optional(),
  pressurePa: quantity("pressure (Pa)", 10_000, 120_000).optional(),
  windMS: quantity("wind (m/s)", 0, 60).optional(),
  gustMS: quantity("gust (m/s)", 0, 80).optional(),
  /** Height above the ground the wind and gust were measured at; absent = 10 m (WMO-No. 8). */
  windMeasuredAtM: positive("wind measured at (m)", 1000).optional(),
  /** α of the power law V(z) = V_ref·(z/z_ref)^α; absent = 1/7; 0 = the same wind at every height. */
  windShearExponent: quantity("wind shear exponent", 0, 1).optional(),
  /** 0–1; absent = dry air, as in ISA. */
  relativeHumidity: quantity("relative humidity (fraction)", 0, 1).optional(),
});

export const mountSchema = z.object(
  {
    positionX: coordinateM("mount position x"),
    massKg: quantity("mount mass (kg)", 0, 10_000),
    thread: threadSchema,
    ratedLoadKg: quantity("mount rated load (kg)", 0, 100_000),
    /** Breaking load of the safety line from the mount to the payloads. */
    safetyLineBreakingLoadN: quantity("safety-line breaking load (N)", 0, 1e7).optional(),
  },
  section("mount"),
);

export const payloadSchema = z.object(
  {
    name: z.string("payload name must be text").min(1, "payload name must not be empty").max(120),
    massKg: quantity("payload mass (kg)", 0, 10_000),
    offset: vecSchema,
    attachment: attachmentSchema,
    /** `from` is the payload's side ("strap" for a clamp plate), `to` the mount's screw. */
    adapter: z
      .object({
        massKg: quantity("adapter mass (kg)", 0, 1000),
        from: attachmentSchema,
        to: threadSchema,
      })
      .optional(),
    size: z
      .object({
        lengthM: quantity("payload length (m)", 0, 100),
        widthM: quantity("payload width (m)", 0, 100),
        heightM: quantity("payload height (m)", 0, 100),
      })
      .optional(),
    dragAreaM2: quantity("payload drag area (m²)", 0, 1000).optional(),
  },
  section("payload"),
);

export const tetherSchema = z.object({
  massPerMetreKg: positive("tether mass per metre (kg/m)", 100),
  lengthOutM: quantity("tether out (m)", 0, 100_000),
  breakingLoadN: positive("tether breaking load (N)", 1e9),
  /** Line diameter for its drag in the wind; absent = no line drag. */
  diameterM: positive("tether diameter (m)", 0.1).optional(),
  /** C_n of the line in cross-flow; absent = 1.2 (circular cylinder, Hoerner). */
  normalDragCoefficient: quantity("tether normal drag coefficient", 0, 5).optional(),
  /** C_f of the air running along the line; absent = 0.01 (common practice). */
  skinFrictionCoefficient: quantity("tether skin friction coefficient", 0, 1).optional(),
});

export const balanceInputSchema = z.object(
  {
    envelope: envelopeSchema,
    gas: gasSchema.optional(),
    site: siteSchema.optional(),
    mount: mountSchema,
    payloads: z.array(payloadSchema, "payloads must be a list").max(100, "at most 100 payloads"),
    tether: tetherSchema.optional(),
  },
  section("setup"),
);

export type BalanceInput = z.infer<typeof balanceInputSchema>;
export type PayloadInput = z.infer<typeof payloadSchema>;
export type LimitsInput = z.infer<typeof limitsSchema>;
export type Thread = z.infer<typeof threadSchema>;
export type Attachment = z.infer<typeof attachmentSchema>;

/** Readonly view of any input: the engine never mutates what it is given. */
export type DeepReadonly<T> = T extends (infer E)[]
  ? readonly DeepReadonly<E>[]
  : T extends object
    ? { readonly [K in keyof T]: DeepReadonly<T[K]> }
    : T;

/** What an operating envelope is asked for: the grid's extent and, optionally, a height to reach. */
export const envelopeOptionsSchema = z.object({
  maxWindMS: positive("largest wind of the grid (m/s)", 40).optional(),
  windCount: z
    .number("wind count must be a number")
    .int("wind count must be a whole number")
    .min(2, "wind count must be at least 2")
    .max(41, "wind count must be at most 41")
    .optional(),
  lineCount: z
    .number("line-out count must be a number")
    .int("line-out count must be a whole number")
    .min(2, "line-out count must be at least 2")
    .max(40, "line-out count must be at most 40")
    .optional(),
  /** The payload height wanted, for the line out that reaches it at targetWindMS. */
  targetHeightM: positive("target height (m)", 10_000).optional(),
  /** The wind to reach the target height in; absent = the setup's own wind. */
  targetWindMS: quantity("target wind (m/s)", 0, 60).optional(),
});

export const operatingEnvelopeRequestSchema = z.object(
  {
    setup: balanceInputSchema,
    options: envelopeOptionsSchema.optional(),
  },
  section("envelope request"),
);

export type EnvelopeOptions = z.infer<typeof envelopeOptionsSchema>;
export type OperatingEnvelopeRequest = z.infer<typeof operatingEnvelopeRequestSchema>;
