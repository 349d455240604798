import { z } from "zod";
import { aeroSchema, hullParamsSchema, limitsSchema } from "@/lib/balance";
import { ATTACHMENTS, INPUT_LIMITS, MAX_NAME_LENGTH, THREADS, type InputLimitKey } from "@/lib/domain";
import { setupPayloadDraftSchema } from "@/lib/setups/setup-draft";

// What the maker edits in the Workshop, in SI: one schema per kind of catalogue item, used by the
// Workshop's forms (through react-hook-form's zod resolver) and by the route handlers alike, so a
// form can never accept what the server refuses.

const number = (label: string, min: number, max: number) =>
  z.number(`${label} must be a number`).min(min, `${label} must be at least ${min}`).max(max, `${label} must be at most ${max}`);
const fromLimits = (key: InputLimitKey) => {
  const { label, unit, min, max } = INPUT_LIMITS[key];
  return number(unit ? `${label} (${unit})` : label, min, max);
};
const name = z.string().trim().min(1, "Give it a name.").max(MAX_NAME_LENGTH, `At most ${MAX_NAME_LENGTH} characters.`);
const description = z.string().trim().max(500, "At most 500 characters.");
export const catalogueIdSchema = z.string().min(1).max(64);

export const envelopeModelValuesSchema = z
  .object({
    slug: z
      .string()
      .trim()
      .regex(/^[a-z0-9][a-z0-9-]{1,39}$/, "Lower-case letters, digits and dashes, 2 to 40 of them."),
    name,
    description,
    hull: hullParamsSchema,
    nominalMassKg: number("envelope mass (kg)", 0.01, 1000),
    massCentreXM: number("mass centre x (m)", -5, 60),
    massCentreZM: number("mass centre z (m)", -20, 20),
    tetherPointXM: number("tether point x (m)", -5, 60),
    tetherPointZM: number("tether point z (m)", -40, 20),
    railStartXM: number("rail start (m)", 0, 60),
    railEndXM: number("rail end (m)", 0, 60),
    railZM: number("rail height (m)", -20, 20),
    railTabCount: z
      .number("rail tabs must be a number")
      .int("rail tabs must be a whole number")
      .min(2, "at least 2 rail tabs")
      .max(100, "at most 100 rail tabs"),
    aero: aeroSchema.nullable(),
    limits: limitsSchema,
  })
  .superRefine((m, ctx) => {
    if (m.railEndXM <= m.railStartXM)
      ctx.addIssue({ code: "custom", path: ["railEndXM"], message: "The rail must end aft of where it starts." });
    if (m.railEndXM > m.hull.lengthM)
      ctx.addIssue({ code: "custom", path: ["railEndXM"], message: "The rail must end on the hull (not aft of its length)." });
    if (m.tetherPointZM >= m.railZM)
      ctx.addIssue({ code: "custom", path: ["tetherPointZM"], message: "The tether point must be below the rail." });
    const { stopTrimDeg, cautionTrimDeg, stopTetherAngleDeg, cautionTetherAngleDeg } = m.limits;
    if (stopTrimDeg !== undefined && cautionTrimDeg !== undefined && stopTrimDeg < cautionTrimDeg) {
      ctx.addIssue({ code: "custom", path: ["limits", "stopTrimDeg"], message: "The stop trim must not be below the caution trim." });
    }
    if (stopTetherAngleDeg !== undefined && cautionTetherAngleDeg !== undefined && stopTetherAngleDeg < cautionTetherAngleDeg) {
      ctx.addIssue({
        code: "custom",
        path: ["limits", "stopTetherAngleDeg"],
        message: "The stop tether angle must not be below the caution angle.",
      });
    }
  });
export type EnvelopeModelValues = z.infer<typeof envelopeModelValuesSchema>;

export const mountValuesSchema = z.object({
  name,
  thread: z.enum(THREADS, { message: `Thread must be one of ${THREADS.join(", ")}.` }),
  massKg: number("mass (kg)", 0, 10),
  ratedLoadKg: number("rated load (kg)", 0.01, 1000),
  safetyLineBreakingLoadN: number("safety-line breaking load (N)", 1, 1e6),
});
export type MountValues = z.infer<typeof mountValuesSchema>;

export const adapterValuesSchema = z.object({
  name,
  fromThread: z.enum(ATTACHMENTS, { message: `The payload's side must be one of ${ATTACHMENTS.join(", ")}.` }),
  toThread: z.enum(THREADS, { message: `The mount's side must be one of ${THREADS.join(", ")}.` }),
  massKg: number("mass (kg)", 0, 10),
  ratedLoadKg: number("rated load (kg)", 0.01, 1000),
});
export type AdapterValues = z.infer<typeof adapterValuesSchema>;

/** A template is a payload as a setup carries it (the same bounds), less the setup's own links. */
export const payloadTemplateValuesSchema = setupPayloadDraftSchema.omit({ templateId: true, adapterId: true }).extend({ description });
export type PayloadTemplateValues = z.infer<typeof payloadTemplateValuesSchema>;

export const envelopeUnitValuesSchema = z.object({
  serial: z
    .string()
    .trim()
    .regex(/^[A-Za-z0-9][A-Za-z0-9-]{1,39}$/, "Letters, digits and dashes, 2 to 40 of them."),
  modelId: catalogueIdSchema,
  /** The customer who owns it, by e-mail; empty: the workshop's own (not yet sold). */
  ownerEmail: z.union([z.literal(""), z.email("Give the owner's e-mail, or leave it empty.")]),
  measuredMassKg: number("weighed mass (kg)", 0.01, 1000),
  notes: z.string().trim().max(500, "At most 500 characters."),
});
export type EnvelopeUnitValues = z.infer<typeof envelopeUnitValuesSchema>;

const isoDate = z
  .string()
  .regex(/^\d{4}-\d{2}-\d{2}$/, "A date as yyyy-mm-dd.")
  .refine(
    (text) => !Number.isNaN(Date.parse(`${text}T00:00:00Z`)) && new Date(`${text}T00:00:00Z`).toISOString().startsWith(text),
    "Not a calendar date.",
  );

export const liftTestValuesSchema = z.object({
  measuredGrossLiftKg: number("measured gross lift (kg)", 0.001, 1000),
  temperatureC: fromLimits("temperatureC"),
  /** Station pressure at the test; null: ISA at the altitude. */
  pressurePa: fromLimits("pressurePa").nullable(),
  altitudeM: fromLimits("altitudeM"),
  purity: fromLimits("purity"),
  testedOn: isoDate,
  notes: z.string().trim().max(500, "At most 500 characters."),
});
export type LiftTestValues = z.infer<typeof liftTestValuesSchema>;

/** The kinds of catalogue item, as they appear in addresses and the audit log. */
export const CATALOGUE_KINDS = ["models", "units", "mounts", "adapters", "templates"] as const;
export type CatalogueKind = (typeof CATALOGUE_KINDS)[number];

export const CATALOGUE_KIND_WORDS: Record<CatalogueKind, { one: string; many: string }> = {
  models: { one: "envelope model", many: "envelope models" },
  units: { one: "serial unit", many: "serial units" },
  mounts: { one: "mount", many: "mounts" },
  adapters: { one: "adapter", many: "adapters" },
  templates: { one: "payload template", many: "payload templates" },
};

export const WORKSHOP_PAGE_SIZE = 25;
export const pageQuerySchema = z.object({
  page: z.coerce.number().int("page must be a whole number").min(1, "page starts at 1").max(100_000).default(1),
});

/** The payload templates CSV's columns, SI units in their names (lib/catalogue/templates-csv.ts reads and writes them). */
export const TEMPLATE_CSV_COLUMNS = [
  "id",
  "name",
  "description",
  "category",
  "mass_kg",
  "shape",
  "length_m",
  "width_m",
  "height_m",
  "attachment",
  "drag_area_m2",
  "offset_x_m",
  "offset_z_m",
] as const;
