import "server-only";
import { and, asc, eq, inArray, isNull, or } from "drizzle-orm";
import { getDb } from "@/db";
import { adapters, envelopeModels, envelopeUnits, mounts, payloadTemplates } from "@/db/schema";
import type { SetupDraft } from "@/lib/setups/setup-draft";

// ---------------------------------------------------------------- the Workshop's lists

export async function listEnvelopeModels() {
  return getDb().select().from(envelopeModels).orderBy(asc(envelopeModels.gasVolumeM3));
}

export async function listActiveEnvelopeModels() {
  return getDb().select().from(envelopeModels).where(eq(envelopeModels.active, true)).orderBy(asc(envelopeModels.gasVolumeM3));
}

export async function listEnvelopeUnits() {
  return getDb().select().from(envelopeUnits).orderBy(asc(envelopeUnits.serial));
}

export async function listMounts() {
  return getDb().select().from(mounts).orderBy(asc(mounts.name));
}

export async function listPayloadTemplates() {
  return getDb().select().from(payloadTemplates).orderBy(asc(payloadTemplates.category), asc(payloadTemplates.name));
}

// ---------------------------------------------------------------- what a setup may draw on

/** Everything the Planner may offer this customer: active models, their own units, mounts, adapters, templates. */
export async function getPlannerCatalogue({ ownerId }: { ownerId: string }) {
  const db = getDb();
  const [models, units, mountRows, adapterRows, templates] = await Promise.all([
    listActiveEnvelopeModels(),
    db.select().from(envelopeUnits).where(eq(envelopeUnits.ownerId, ownerId)).orderBy(asc(envelopeUnits.serial)),
    db.select().from(mounts).where(eq(mounts.active, true)).orderBy(asc(mounts.name)),
    db.select().from(adapters).orderBy(asc(adapters.name)),
    listPayloadTemplates(),
  ]);
  return { models, units, mounts: mountRows, adapters: adapterRows, templates };
}
export type PlannerCatalogueRows = Awaited<ReturnType<typeof getPlannerCatalogue>>;

const distinct = (ids: (string | null)[]): string[] => [...new Set(ids.filter((id): id is string => id !== null))];

/** The catalogue rows one draft names; null or missing entries where a name does not exist (or is not the viewer's unit). */
export async function getCatalogueForDraft({ draft, ownerId }: { draft: SetupDraft; ownerId: string }) {
  const db = getDb();
  const adapterIds = distinct(draft.payloads.map((p) => p.adapterId));
  const templateIds = distinct(draft.payloads.map((p) => p.templateId));
  const [[model], unitRows, [mount], adapterRows, templateRows] = await Promise.all([
    db.select().from(envelopeModels).where(eq(envelopeModels.id, draft.modelId)),
    draft.unitId
      ? db
          .select()
          .from(envelopeUnits)
          .where(and(eq(envelopeUnits.id, draft.unitId), or(eq(envelopeUnits.ownerId, ownerId), isNull(envelopeUnits.ownerId))))
      : Promise.resolve([]),
    db.select().from(mounts).where(eq(mounts.id, draft.mountId)),
    adapterIds.length ? db.select().from(adapters).where(inArray(adapters.id, adapterIds)) : Promise.resolve([]),
    templateIds.length ? db.select({ id: payloadTemplates.id }).from(payloadTemplates).where(inArray(payloadTemplates.id, templateIds)) : Promise.resolve([]),
  ]);
  return {
    model: model ?? null,
    unit: unitRows[0] ?? null,
    mount: mount ?? null,
    adaptersById: Object.fromEntries(adapterRows.map((a) => [a.id, a])),
    knownTemplateIds: new Set(templateRows.map((t) => t.id)),
  };
}
