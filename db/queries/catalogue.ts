import "server-only";
import { asc, count } from "drizzle-orm";
import { getDb } from "@/db";
import { adapters, envelopeModels, envelopeUnits, mounts, payloadTemplates } from "@/db/schema";

export async function listEnvelopeModels() {
  return getDb().select().from(envelopeModels).orderBy(asc(envelopeModels.gasVolumeM3));
}

export async function listEnvelopeUnits() {
  return getDb().select().from(envelopeUnits).orderBy(asc(envelopeUnits.serial));
}

export async function listMounts() {
  return getDb().select().from(mounts).orderBy(asc(mounts.name));
}

export async function listAdapters() {
  return getDb().select().from(adapters).orderBy(asc(adapters.name));
}

export async function listPayloadTemplates() {
  return getDb().select().from(payloadTemplates).orderBy(asc(payloadTemplates.category), asc(payloadTemplates.name));
}

export async function countCatalogue(): Promise<Record<"models" | "units" | "mounts" | "adapters" | "templates", number>> {
  const db = getDb();
  const [[m], [u], [mo], [a], [t]] = await Promise.all([
    db.select({ n: count() }).from(envelopeModels),
    db.select({ n: count() }).from(envelopeUnits),
    db.select({ n: count() }).from(mounts),
    db.select({ n: count() }).from(adapters),
    db.select({ n: count() }).from(payloadTemplates),
  ]);
  return { models: m.n, units: u.n, mounts: mo.n, adapters: a.n, templates: t.n };
}
