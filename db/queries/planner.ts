import "server-only";
import { and, asc, eq, inArray, isNull, or } from "drizzle-orm";
import { getDb } from "@/db";
import { adapters, envelopeModels, envelopeUnits, mounts, payloadTemplates, setupPayloads, setups, type SetupRow } from "@/db/schema";
import type { SetupDraft } from "@/lib/setups/setup-draft";

/** Everything the Planner may offer this customer: active models, their own units, mounts, adapters, templates. */
export async function getPlannerCatalogue({ ownerId }: { ownerId: string }) {
  const db = getDb();
  const [models, units, mountRows, adapterRows, templates] = await Promise.all([
    db.select().from(envelopeModels).where(eq(envelopeModels.active, true)).orderBy(asc(envelopeModels.gasVolumeM3)),
    db.select().from(envelopeUnits).where(eq(envelopeUnits.ownerId, ownerId)).orderBy(asc(envelopeUnits.serial)),
    db.select().from(mounts).where(eq(mounts.active, true)).orderBy(asc(mounts.name)),
    db.select().from(adapters).orderBy(asc(adapters.name)),
    db.select().from(payloadTemplates).orderBy(asc(payloadTemplates.category), asc(payloadTemplates.name)),
  ]);
  return { models, units, mounts: mountRows, adapters: adapterRows, templates };
}
export type PlannerCatalogueRows = Awaited<ReturnType<typeof getPlannerCatalogue>>;

/** The catalogue rows one draft names; null fields when a name does not exist (or is not the viewer's unit). */
export async function getCatalogueForDraft({ draft, ownerId }: { draft: SetupDraft; ownerId: string }) {
  const db = getDb();
  const adapterIds = [...new Set(draft.payloads.map((p) => p.adapterId).filter((id): id is string => id !== null))];
  const [[model], unitRows, [mount], adapterRows] = await Promise.all([
    db.select().from(envelopeModels).where(eq(envelopeModels.id, draft.modelId)),
    draft.unitId
      ? db
          .select()
          .from(envelopeUnits)
          .where(and(eq(envelopeUnits.id, draft.unitId), or(eq(envelopeUnits.ownerId, ownerId), isNull(envelopeUnits.ownerId))))
      : Promise.resolve([]),
    db.select().from(mounts).where(eq(mounts.id, draft.mountId)),
    adapterIds.length ? db.select().from(adapters).where(inArray(adapters.id, adapterIds)) : Promise.resolve([]),
  ]);
  const unit = unitRows[0] ?? null;
  return {
    model: model ?? null,
    unit,
    unitMissing: draft.unitId !== null && unit === null,
    unitModelMismatch: unit !== null && model !== undefined && unit.modelId !== model.id,
    mount: mount ?? null,
    adaptersById: Object.fromEntries(adapterRows.map((a) => [a.id, a])),
    missingAdapterIds: adapterIds.filter((id) => !adapterRows.some((a) => a.id === id)),
  };
}

export interface StoredSetup {
  row: SetupRow;
  draft: SetupDraft;
}

export function draftFromRows(row: SetupRow, payloadRows: (typeof setupPayloads.$inferSelect)[]): SetupDraft {
  const tether =
    row.tetherMassPerMetreKg !== null && row.tetherLengthOutM !== null && row.tetherBreakingLoadN !== null
      ? { massPerMetreKg: row.tetherMassPerMetreKg, lengthOutM: row.tetherLengthOutM, breakingLoadN: row.tetherBreakingLoadN }
      : null;
  return {
    name: row.name,
    modelId: row.modelId,
    unitId: row.unitId,
    mountId: row.mountId,
    mountPositionXM: row.mountPositionXM,
    site: {
      siteName: row.siteName,
      altitudeM: row.altitudeM,
      temperatureC: row.temperatureC,
      pressurePa: row.pressurePa,
      windMS: row.windMS,
      gustMS: row.gustMS,
    },
    gas: { purity: row.purity, superheatK: row.superheatK, fillFraction: row.fillFraction },
    tether,
    payloads: [...payloadRows]
      .sort((a, b) => a.sortOrder - b.sortOrder)
      .map((p) => ({
        templateId: p.templateId,
        name: p.name,
        category: p.category,
        massKg: p.massKg,
        shape: p.shape,
        lengthM: p.lengthM,
        widthM: p.widthM,
        heightM: p.heightM,
        attachment: p.attachment,
        adapterId: p.adapterId,
        dragAreaM2: p.dragAreaM2,
        offsetXM: p.offsetXM,
        offsetZM: p.offsetZM,
      })),
  };
}

/** A setup with its payloads, or null: only its owner's when `ownerId` is given, any when it is null (staff). */
export async function getSetupById({ id, ownerId }: { id: string; ownerId: string | null }): Promise<StoredSetup | null> {
  const db = getDb();
  const where = ownerId === null ? eq(setups.id, id) : and(eq(setups.id, id), eq(setups.ownerId, ownerId));
  const [row] = await db.select().from(setups).where(where);
  if (!row) return null;
  const payloadRows = await db.select().from(setupPayloads).where(eq(setupPayloads.setupId, id));
  return { row, draft: draftFromRows(row, payloadRows) };
}
