import { z } from "zod";
import {
  ATTACHMENTS,
  DEFAULT_WIND_MEASUREMENT,
  INPUT_LIMITS,
  LIFT_CHECK_LOADS,
  LIFT_CHECK_UNKNOWNS,
  MAX_NAME_LENGTH,
  MAX_PAYLOADS_PER_SETUP,
  PAYLOAD_CATEGORIES,
  PAYLOAD_SHAPES,
  type InputLimitKey,
} from "@/lib/domain";

// What a person edits in the Planner and what the server stores: the inputs of a setup, never its
// computed balance (the server recomputes that from these and the catalogue).

/** A number within the field's bounds from the one table, with messages that name the field and its unit. */
const bounded = (key: InputLimitKey) => {
  const { label, unit, min, max } = INPUT_LIMITS[key];
  const named = unit ? `${label} (${unit})` : label;
  return z.number(`${named} must be a number`).min(min, `${named} must be at least ${min}`).max(max, `${named} must be at most ${max}`);
};
const id = z.string().min(1).max(64);
const name = (missing: string) => z.string().trim().min(1, missing).max(MAX_NAME_LENGTH, `At most ${MAX_NAME_LENGTH} characters.`);

export const setupPayloadDraftSchema = z.object({
  templateId: id.nullable(),
  name: name("Give the payload a name."),
  category: z.enum(PAYLOAD_CATEGORIES),
  massKg: bounded("payloadMassKg"),
  shape: z.enum(PAYLOAD_SHAPES),
  lengthM: bounded("payloadSizeM"),
  widthM: bounded("payloadSizeM"),
  heightM: bounded("payloadSizeM"),
  attachment: z.enum(ATTACHMENTS),
  adapterId: id.nullable(),
  dragAreaM2: bounded("payloadDragAreaM2"),
  offsetXM: bounded("payloadOffsetXM"),
  offsetZM: bounded("payloadOffsetZM"),
});

/** The day's lift check: the free lift weighed at the field, the air temperature then, what hung on it, what it settles. */
export const liftCheckDraftSchema = z.object({
  freeLiftKg: bounded("liftCheckFreeLiftKg"),
  temperatureC: bounded("temperatureC"),
  weighedWith: z.enum(LIFT_CHECK_LOADS, { message: `What hung on it must be one of ${LIFT_CHECK_LOADS.join(", ")}.` }),
  solveFor: z.enum(LIFT_CHECK_UNKNOWNS, { message: `The check settles one of ${LIFT_CHECK_UNKNOWNS.join(", ")}.` }),
});

export const setupDraftSchema = z.object({
  name: name("Give the setup a name."),
  modelId: id,
  unitId: id.nullable(),
  mountId: id,
  mountPositionXM: bounded("mountPositionXM"),
  site: z.object({
    siteName: z.string().trim().max(MAX_NAME_LENGTH),
    altitudeM: bounded("altitudeM"),
    temperatureC: bounded("temperatureC").nullable(),
    pressurePa: bounded("pressurePa").nullable(),
    windMS: bounded("windMS"),
    gustMS: bounded("gustMS").nullable(),
    // Drafts saved before these existed lack them: the defaults are the engine's own.
    windMeasuredAtM: bounded("windMeasuredAtM").default(DEFAULT_WIND_MEASUREMENT.windMeasuredAtM),
    windShearExponent: bounded("windShearExponent").default(DEFAULT_WIND_MEASUREMENT.windShearExponent),
    relativeHumidity: bounded("relativeHumidity").nullable().default(null),
  }),
  gas: z.object({
    purity: bounded("purity"),
    superheatK: bounded("superheatK"),
    fillFraction: bounded("fillFraction"),
  }),
  tether: z
    .object({
      massPerMetreKg: bounded("tetherMassPerMetreKg"),
      lengthOutM: bounded("tetherLengthOutM"),
      breakingLoadN: bounded("tetherBreakingLoadN"),
      diameterM: bounded("tetherDiameterM").nullable().default(null),
    })
    .nullable(),
  /** The payload height wanted, for the operating envelope's line out; null = none asked. */
  targetHeightM: bounded("targetHeightM").nullable().default(null),
  payloads: z.array(setupPayloadDraftSchema).max(MAX_PAYLOADS_PER_SETUP, `At most ${MAX_PAYLOADS_PER_SETUP} payloads on one mount.`),
  /** Absent or null: no lift check today; the gas is as entered. */
  liftCheck: liftCheckDraftSchema.nullable().optional(),
});

export type SetupDraft = z.infer<typeof setupDraftSchema>;
export type SetupPayloadDraft = z.infer<typeof setupPayloadDraftSchema>;
export type LiftCheckDraft = z.infer<typeof liftCheckDraftSchema>;
