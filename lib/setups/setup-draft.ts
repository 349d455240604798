import { z } from "zod";
import { ATTACHMENTS, PAYLOAD_CATEGORIES, PAYLOAD_SHAPES } from "@/lib/domain";

// What a person edits in the Planner and what the server stores: the inputs of a setup, never its
// computed balance (the server recomputes that from these and the catalogue).

const metres = (label: string, min: number, max: number) =>
  z.number(`${label} must be a number`).min(min, `${label} must be at least ${min}`).max(max, `${label} must be at most ${max}`);
const id = z.string().min(1).max(64);

export const setupPayloadDraftSchema = z.object({
  templateId: id.nullable(),
  name: z.string().trim().min(1, "Give the payload a name.").max(120, "At most 120 characters."),
  category: z.enum(PAYLOAD_CATEGORIES),
  massKg: metres("mass (kg)", 0.001, 50),
  shape: z.enum(PAYLOAD_SHAPES),
  lengthM: metres("length (m)", 0.001, 5),
  widthM: metres("width (m)", 0.001, 5),
  heightM: metres("height (m)", 0.001, 5),
  attachment: z.enum(ATTACHMENTS),
  adapterId: id.nullable(),
  dragAreaM2: metres("drag area (m²)", 0, 5),
  offsetXM: metres("offset x (m)", -2, 2),
  offsetZM: metres("offset z (m)", -5, 1),
});

export const setupDraftSchema = z.object({
  name: z.string().trim().min(1, "Give the setup a name.").max(120, "At most 120 characters."),
  modelId: id,
  unitId: id.nullable(),
  mountId: id,
  mountPositionXM: metres("mount position (m)", -5, 60),
  site: z.object({
    siteName: z.string().trim().max(120),
    altitudeM: metres("altitude (m)", -500, 6000),
    temperatureC: metres("temperature (°C)", -60, 55).nullable(),
    pressurePa: metres("pressure (Pa)", 30_000, 110_000).nullable(),
    windMS: metres("wind (m/s)", 0, 40),
    gustMS: metres("gust (m/s)", 0, 60).nullable(),
  }),
  gas: z.object({
    purity: metres("purity", 0.5, 1),
    superheatK: metres("superheat (K)", -20, 40),
    fillFraction: metres("fill", 0.05, 1),
  }),
  tether: z
    .object({
      massPerMetreKg: metres("tether mass per metre (kg/m)", 0.00001, 1),
      lengthOutM: metres("tether out (m)", 0, 3000),
      breakingLoadN: metres("tether breaking load (N)", 1, 1e6),
    })
    .nullable(),
  payloads: z.array(setupPayloadDraftSchema).max(12, "At most 12 payloads on one mount."),
});

export type SetupDraft = z.infer<typeof setupDraftSchema>;
export type SetupPayloadDraft = z.infer<typeof setupPayloadDraftSchema>;
