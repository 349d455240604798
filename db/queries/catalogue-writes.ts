import "server-only";
import { and, eq, inArray, ne } from "drizzle-orm";
import type { SQLiteColumn } from "drizzle-orm/sqlite-core";
import { randomUUID } from "node:crypto";
import { getDb } from "@/db";
import { adapters, envelopeModels, envelopeUnits, mounts, payloadTemplates, unitLiftTests, user } from "@/db/schema";
import type { AdapterValues, CatalogueKind, LiftTestValues, MountValues, PayloadTemplateValues } from "@/lib/catalogue/schemas";
import { recordAudit } from "./audit";
import { setupCountSql } from "./catalogue";
import type { Tx } from "./setups";

// The Workshop's writes. Each runs in one transaction with its audit line; an item that setups use
// is retired (active = false), never deleted, so every old setup still finds what it names.

const TABLES = { models: envelopeModels, units: envelopeUnits, mounts, adapters, templates: payloadTemplates } as const;
const AUDIT_TYPES = {
  models: "envelope_model",
  units: "envelope_unit",
  mounts: "mount",
  adapters: "adapter",
  templates: "payload_template",
} as const;

export type WriteOutcome<T = { id: string }> =
  | { kind: "ok"; data: T }
  | { kind: "not_found" }
  | { kind: "taken"; field: string }
  | { kind: "in_use"; setupCount: number }
  | { kind: "has_units" };

/** The columns that must be unique within each kind, as the maker names them. */
const UNIQUE = {
  models: { name: envelopeModels.name, slug: envelopeModels.slug },
  units: { serial: envelopeUnits.serial },
  mounts: { name: mounts.name },
  adapters: { name: adapters.name },
  templates: { name: payloadTemplates.name },
} as const;

async function isTaken(
  tx: Tx,
  kind: CatalogueKind,
  field: "name" | "slug" | "serial",
  value: string,
  exceptId: string | null,
): Promise<boolean> {
  const table = TABLES[kind] as typeof mounts;
  const column = (UNIQUE[kind] as Record<string, SQLiteColumn>)[field];
  const [row] = await tx
    .select({ id: table.id })
    .from(table)
    .where(exceptId ? and(eq(column, value), ne(table.id, exceptId)) : eq(column, value));
  return row !== undefined;
}

// ---------------------------------------------------------------- envelope models

/** Every stored column of a model, computed by the caller from the maker's values and the hull. */
export type ModelColumns = Omit<typeof envelopeModels.$inferInsert, "id" | "createdAt" | "updatedAt" | "active">;

export async function createEnvelopeModel({
  actorId,
  columns,
  id = randomUUID(),
}: {
  actorId: string;
  columns: (id: string) => ModelColumns;
  id?: string;
}): Promise<WriteOutcome> {
  return getDb().transaction(async (tx) => {
    const values = columns(id);
    if (await isTaken(tx, "models", "slug", values.slug, null)) return { kind: "taken", field: "slug" };
    if (await isTaken(tx, "models", "name", values.name, null)) return { kind: "taken", field: "name" };
    await tx.insert(envelopeModels).values({ ...values, id });
    await recordAudit(tx, {
      actorId,
      action: "catalogue.create",
      entityType: "envelope_model",
      entityId: id,
      detail: { name: values.name },
    });
    return { kind: "ok", data: { id } };
  });
}

export async function updateEnvelopeModel({
  actorId,
  id,
  columns,
}: {
  actorId: string;
  id: string;
  columns: (before: typeof envelopeModels.$inferSelect) => ModelColumns;
}): Promise<WriteOutcome> {
  return getDb().transaction(async (tx) => {
    const [before] = await tx.select().from(envelopeModels).where(eq(envelopeModels.id, id));
    if (!before) return { kind: "not_found" };
    const values = columns(before);
    if (await isTaken(tx, "models", "slug", values.slug, id)) return { kind: "taken", field: "slug" };
    if (await isTaken(tx, "models", "name", values.name, id)) return { kind: "taken", field: "name" };
    await tx
      .update(envelopeModels)
      .set({ ...values, updatedAt: new Date() })
      .where(eq(envelopeModels.id, id));
    await recordAudit(tx, {
      actorId,
      action: "catalogue.update",
      entityType: "envelope_model",
      entityId: id,
      detail: {
        name: values.name,
        gasVolumeM3: { from: before.gasVolumeM3, to: values.gasVolumeM3 },
        nominalMassKg: { from: before.nominalMassKg, to: values.nominalMassKg },
      },
    });
    return { kind: "ok", data: { id } };
  });
}

// ---------------------------------------------------------------- serial units and their lift tests

async function ownerIdOf(tx: Tx, email: string): Promise<string | null | "unknown"> {
  if (email === "") return null;
  const [row] = await tx.select({ id: user.id, role: user.role }).from(user).where(eq(user.email, email.toLowerCase()));
  return row && row.role === "customer" ? row.id : "unknown";
}

export interface UnitColumns {
  serial: string;
  modelId: string;
  ownerEmail: string;
  measuredMassKg: number;
  notes: string;
}

export async function saveEnvelopeUnit({
  actorId,
  id,
  values,
  today,
}: {
  actorId: string;
  id: string | null;
  values: UnitColumns;
  today: string;
}): Promise<WriteOutcome | { kind: "bad"; field: string; message: string }> {
  return getDb().transaction(async (tx) => {
    const [model] = await tx.select({ id: envelopeModels.id }).from(envelopeModels).where(eq(envelopeModels.id, values.modelId));
    if (!model) return { kind: "bad", field: "modelId", message: "unknown envelope model" };
    const ownerId = await ownerIdOf(tx, values.ownerEmail);
    if (ownerId === "unknown") return { kind: "bad", field: "ownerEmail", message: "no customer has that e-mail" };
    if (await isTaken(tx, "units", "serial", values.serial, id)) return { kind: "taken", field: "serial" };
    const columns = { serial: values.serial, modelId: values.modelId, ownerId, measuredMassKg: values.measuredMassKg, notes: values.notes };
    if (id === null) {
      const newId = randomUUID();
      // The single-weighing columns predate lift tests; a new unit has none until its first test.
      await tx
        .insert(envelopeUnits)
        .values({ ...columns, id: newId, measuredGrossLiftKg: 0, measuredAtTemperatureC: 15, measuredAtAltitudeM: 0, measuredOn: today });
      await recordAudit(tx, {
        actorId,
        action: "catalogue.create",
        entityType: "envelope_unit",
        entityId: newId,
        detail: { serial: values.serial },
      });
      return { kind: "ok", data: { id: newId } };
    }
    const [before] = await tx
      .select({ modelId: envelopeUnits.modelId, ownerId: envelopeUnits.ownerId, setupCount: setupCountSql("units") })
      .from(envelopeUnits)
      .where(eq(envelopeUnits.id, id));
    if (!before) return { kind: "not_found" };
    // Setups name the unit by its owner and model: moving it would leave them naming someone else's unit.
    if (Number(before.setupCount) > 0 && (before.modelId !== values.modelId || before.ownerId !== ownerId)) {
      return {
        kind: "bad",
        field: before.modelId !== values.modelId ? "modelId" : "ownerEmail",
        message: `${before.setupCount} setups name this unit as it is; retire it and add the unit anew instead`,
      };
    }
    await tx.update(envelopeUnits).set(columns).where(eq(envelopeUnits.id, id));
    await recordAudit(tx, {
      actorId,
      action: "catalogue.update",
      entityType: "envelope_unit",
      entityId: id,
      detail: { serial: values.serial },
    });
    return { kind: "ok", data: { id } };
  });
}

export async function addLiftTest({
  actorId,
  unitId,
  values,
}: {
  actorId: string;
  unitId: string;
  values: LiftTestValues;
}): Promise<WriteOutcome> {
  return getDb().transaction(async (tx) => {
    const [unit] = await tx.select({ id: envelopeUnits.id }).from(envelopeUnits).where(eq(envelopeUnits.id, unitId));
    if (!unit) return { kind: "not_found" };
    const id = randomUUID();
    await tx.insert(unitLiftTests).values({ id, unitId, ...values });
    await recordAudit(tx, {
      actorId,
      action: "catalogue.lift-test",
      entityType: "envelope_unit",
      entityId: unitId,
      detail: { testId: id, measuredGrossLiftKg: values.measuredGrossLiftKg, testedOn: values.testedOn },
    });
    return { kind: "ok", data: { id } };
  });
}

export async function deleteLiftTest({
  actorId,
  unitId,
  testId,
}: {
  actorId: string;
  unitId: string;
  testId: string;
}): Promise<WriteOutcome> {
  return getDb().transaction(async (tx) => {
    const deleted = await tx
      .delete(unitLiftTests)
      .where(and(eq(unitLiftTests.id, testId), eq(unitLiftTests.unitId, unitId)))
      .returning({ id: unitLiftTests.id });
    if (deleted.length === 0) return { kind: "not_found" };
    await recordAudit(tx, {
      actorId,
      action: "catalogue.lift-test-delete",
      entityType: "envelope_unit",
      entityId: unitId,
      detail: { testId },
    });
    return { kind: "ok", data: { id: testId } };
  });
}

// ---------------------------------------------------------------- mounts, adapters, templates

type SimpleKind = "mounts" | "adapters" | "templates";
type SimpleValues<K extends SimpleKind> = K extends "mounts" ? MountValues : K extends "adapters" ? AdapterValues : PayloadTemplateValues;

async function saveSimpleIn<K extends SimpleKind>(
  tx: Tx,
  { actorId, kind, id, values }: { actorId: string; kind: K; id: string | null; values: SimpleValues<K> },
): Promise<WriteOutcome> {
  const table = TABLES[kind] as typeof mounts;
  if (await isTaken(tx, kind, "name", values.name, id)) return { kind: "taken", field: "name" };
  if (id === null) {
    const newId = randomUUID();
    await tx.insert(table).values({ ...(values as MountValues), id: newId });
    await recordAudit(tx, {
      actorId,
      action: "catalogue.create",
      entityType: AUDIT_TYPES[kind],
      entityId: newId,
      detail: { name: values.name },
    });
    return { kind: "ok", data: { id: newId } };
  }
  const updated = await tx
    .update(table)
    .set(values as MountValues)
    .where(eq(table.id, id))
    .returning({ id: table.id });
  if (updated.length === 0) return { kind: "not_found" };
  await recordAudit(tx, { actorId, action: "catalogue.update", entityType: AUDIT_TYPES[kind], entityId: id, detail: { ...values } });
  return { kind: "ok", data: { id } };
}

export async function saveSimpleItem<K extends SimpleKind>(args: {
  actorId: string;
  kind: K;
  id: string | null;
  values: SimpleValues<K>;
}): Promise<WriteOutcome> {
  return getDb().transaction((tx) => saveSimpleIn(tx, args));
}

export interface TemplateImportRow {
  /** Its row in the file (1 is the first data row), for messages. */
  row: number;
  id: string | null;
  values: PayloadTemplateValues;
}

/**
 * Writes every imported template in one transaction: a row whose id names a template updates it,
 * any other row adds one. The first conflict (a name another template has) undoes the whole import.
 */
export async function importPayloadTemplates({
  actorId,
  rows,
}: {
  actorId: string;
  rows: readonly TemplateImportRow[];
}): Promise<{ kind: "ok"; created: number; updated: number } | { kind: "conflict"; row: number; field: string; message: string }> {
  const db = getDb();
  const ids = rows.flatMap((r) => (r.id ? [r.id] : []));
  const known = new Set(
    ids.length
      ? (await db.select({ id: payloadTemplates.id }).from(payloadTemplates).where(inArray(payloadTemplates.id, ids))).map((r) => r.id)
      : [],
  );
  class Abort extends Error {
    constructor(readonly detail: { row: number; field: string; message: string }) {
      super(detail.message);
    }
  }
  try {
    return await db.transaction(async (tx) => {
      let created = 0;
      let updated = 0;
      for (const row of rows) {
        const id = row.id && known.has(row.id) ? row.id : null;
        const outcome = await saveSimpleIn(tx, { actorId, kind: "templates", id, values: row.values });
        if (outcome.kind !== "ok") throw new Abort({ row: row.row, field: "name", message: "another template already has this name" });
        if (id) updated += 1;
        else created += 1;
      }
      return { kind: "ok" as const, created, updated };
    });
  } catch (error) {
    if (error instanceof Abort) return { kind: "conflict", ...error.detail };
    throw error;
  }
}

// ---------------------------------------------------------------- retire, restore, delete

export async function setCatalogueItemActive({
  actorId,
  kind,
  id,
  active,
}: {
  actorId: string;
  kind: CatalogueKind;
  id: string;
  active: boolean;
}): Promise<WriteOutcome<{ id: string; active: boolean }>> {
  return getDb().transaction(async (tx) => {
    const table = TABLES[kind] as typeof mounts;
    const updated = await tx.update(table).set({ active }).where(eq(table.id, id)).returning({ id: table.id });
    if (updated.length === 0) return { kind: "not_found" };
    await recordAudit(tx, {
      actorId,
      action: active ? "catalogue.restore" : "catalogue.retire",
      entityType: AUDIT_TYPES[kind],
      entityId: id,
    });
    return { kind: "ok", data: { id, active } };
  });
}

/** Deletes an item no setup names; one that setups use is refused with their count (retire it instead). */
export async function deleteCatalogueItem({
  actorId,
  kind,
  id,
}: {
  actorId: string;
  kind: CatalogueKind;
  id: string;
}): Promise<WriteOutcome> {
  return getDb().transaction(async (tx) => {
    const table = TABLES[kind] as typeof mounts;
    const [row] = await tx
      .select({ id: table.id, setupCount: setupCountSql(kind) })
      .from(table)
      .where(eq(table.id, id));
    if (!row) return { kind: "not_found" };
    if (Number(row.setupCount) > 0) return { kind: "in_use", setupCount: Number(row.setupCount) };
    if (kind === "models") {
      const [unit] = await tx.select({ id: envelopeUnits.id }).from(envelopeUnits).where(eq(envelopeUnits.modelId, id)).limit(1);
      if (unit) return { kind: "has_units" };
    }
    await tx.delete(table).where(eq(table.id, id));
    await recordAudit(tx, { actorId, action: "catalogue.delete", entityType: AUDIT_TYPES[kind], entityId: id });
    return { kind: "ok", data: { id } };
  });
}
