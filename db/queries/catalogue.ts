import "server-only";
import { and, asc, count, desc, eq, inArray, isNull, or, sql, type SQL } from "drizzle-orm";
import type { SQLiteColumn, SQLiteTable } from "drizzle-orm/sqlite-core";
import { getDb } from "@/db";
import { adapters, envelopeModels, envelopeUnits, mounts, payloadTemplates, unitLiftTests, user } from "@/db/schema";
import type { AdapterRow, EnvelopeUnitRow, MountRow, PayloadTemplateRow, UnitLiftTestRow } from "@/db/schema";
import type { CatalogueKind } from "@/lib/catalogue/schemas";
import { latestLiftTest, unitCalibrationFactor } from "@/lib/setups/calibration";
import type { SetupDraft } from "@/lib/setups/setup-draft";

// The catalogue: what the Planner may offer, what a draft names, and the Workshop's paged lists.
// The Workshop's writes are in ./catalogue-writes.ts.

// ---------------------------------------------------------------- a unit with its calibration

export type CalibratedUnit = EnvelopeUnitRow & {
  latestTest: UnitLiftTestRow | null;
  /** Measured ÷ predicted gross lift at the latest test; null: no test. */
  calibrationFactor: number | null;
};

async function latestTestsByUnit(unitIds: readonly string[]): Promise<Map<string, UnitLiftTestRow>> {
  if (unitIds.length === 0) return new Map();
  const rows = await getDb()
    .select()
    .from(unitLiftTests)
    .where(inArray(unitLiftTests.unitId, [...unitIds]));
  const byUnit = new Map<string, UnitLiftTestRow[]>();
  for (const row of rows) byUnit.set(row.unitId, [...(byUnit.get(row.unitId) ?? []), row]);
  return new Map(
    [...byUnit].flatMap(([unitId, tests]) => {
      const latest = latestLiftTest(tests);
      return latest ? [[unitId, latest] as const] : [];
    }),
  );
}

async function calibrate(
  units: readonly EnvelopeUnitRow[],
  volumeOfModel: (modelId: string) => number | undefined,
): Promise<CalibratedUnit[]> {
  const latest = await latestTestsByUnit(units.map((u) => u.id));
  return units.map((unit) => {
    const test = latest.get(unit.id) ?? null;
    const volume = volumeOfModel(unit.modelId);
    return { ...unit, latestTest: test, calibrationFactor: volume === undefined ? null : unitCalibrationFactor(volume, test) };
  });
}

// ---------------------------------------------------------------- what a setup may draw on

export async function listEnvelopeModels() {
  return getDb().select().from(envelopeModels).orderBy(asc(envelopeModels.gasVolumeM3));
}

export async function listActiveEnvelopeModels() {
  return getDb().select().from(envelopeModels).where(eq(envelopeModels.active, true)).orderBy(asc(envelopeModels.gasVolumeM3));
}

/** Catalogue items a setup already names: offered even when retired, so the setup still opens. */
export interface CatalogueIncludes {
  modelIds?: readonly string[];
  unitIds?: readonly string[];
  mountIds?: readonly string[];
  adapterIds?: readonly string[];
  templateIds?: readonly string[];
}

const activeOr = (active: SQLiteColumn, id: SQLiteColumn, ids: readonly string[] | undefined): SQL | undefined =>
  ids && ids.length ? or(eq(active, true), inArray(id, [...ids])) : eq(active, true);

/** The ids of the catalogue items a draft names, for `includeIds`. */
export function catalogueIdsOfDraft(draft: SetupDraft): Required<CatalogueIncludes> {
  const present = (ids: (string | null)[]) => [...new Set(ids.filter((id): id is string => id !== null))];
  return {
    modelIds: [draft.modelId],
    unitIds: present([draft.unitId]),
    mountIds: [draft.mountId],
    adapterIds: present(draft.payloads.map((p) => p.adapterId)),
    templateIds: present(draft.payloads.map((p) => p.templateId)),
  };
}

/**
 * Everything the Planner may offer this customer: active models, their own active units, active
 * mounts, adapters and templates — plus any retired item in `includeIds` (what the open setup
 * already names), each row saying whether it is active so the Planner offers it only there.
 */
export async function getPlannerCatalogue({ ownerId, includeIds = {} }: { ownerId: string; includeIds?: CatalogueIncludes }) {
  const db = getDb();
  const [models, unitRows, mountRows, adapterRows, templates] = await Promise.all([
    db
      .select()
      .from(envelopeModels)
      .where(activeOr(envelopeModels.active, envelopeModels.id, includeIds.modelIds))
      .orderBy(asc(envelopeModels.gasVolumeM3)),
    db
      .select()
      .from(envelopeUnits)
      .where(and(eq(envelopeUnits.ownerId, ownerId), activeOr(envelopeUnits.active, envelopeUnits.id, includeIds.unitIds)))
      .orderBy(asc(envelopeUnits.serial)),
    db
      .select()
      .from(mounts)
      .where(activeOr(mounts.active, mounts.id, includeIds.mountIds))
      .orderBy(asc(mounts.name)),
    db
      .select()
      .from(adapters)
      .where(activeOr(adapters.active, adapters.id, includeIds.adapterIds))
      .orderBy(asc(adapters.name)),
    db
      .select()
      .from(payloadTemplates)
      .where(activeOr(payloadTemplates.active, payloadTemplates.id, includeIds.templateIds))
      .orderBy(asc(payloadTemplates.category), asc(payloadTemplates.name)),
  ]);
  const volumes = new Map(models.map((m) => [m.id, m.gasVolumeM3]));
  const missingModels = [...new Set(unitRows.map((u) => u.modelId).filter((id) => !volumes.has(id)))];
  if (missingModels.length) {
    for (const m of await db
      .select({ id: envelopeModels.id, v: envelopeModels.gasVolumeM3 })
      .from(envelopeModels)
      .where(inArray(envelopeModels.id, missingModels)))
      volumes.set(m.id, m.v);
  }
  const units = await calibrate(unitRows, (id) => volumes.get(id));
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
    templateIds.length
      ? db
          .select({ id: payloadTemplates.id, active: payloadTemplates.active })
          .from(payloadTemplates)
          .where(inArray(payloadTemplates.id, templateIds))
      : Promise.resolve([]),
  ]);
  const [unit] = model ? await calibrate(unitRows, (id) => (id === model.id ? model.gasVolumeM3 : undefined)) : [];
  return {
    model: model ?? null,
    unit: unit ?? null,
    mount: mount ?? null,
    adaptersById: Object.fromEntries(adapterRows.map((a) => [a.id, a])),
    knownTemplateIds: new Set(templateRows.map((t) => t.id)),
    retiredTemplateIds: new Set(templateRows.filter((t) => !t.active).map((t) => t.id)),
  };
}

// ---------------------------------------------------------------- the Workshop's paged lists

export interface Page<T> {
  rows: T[];
  total: number;
  page: number;
  pageSize: number;
}

const TABLE_NAMES: Record<CatalogueKind, string> = {
  models: "envelope_models",
  units: "envelope_units",
  mounts: "mounts",
  adapters: "adapters",
  templates: "payload_templates",
};
const USAGE: Record<CatalogueKind, string> = {
  models: `select count(*) from "setups" where "setups"."model_id" = `,
  units: `select count(*) from "setups" where "setups"."unit_id" = `,
  mounts: `select count(*) from "setups" where "setups"."mount_id" = `,
  adapters: `select count(distinct "setup_payloads"."setup_id") from "setup_payloads" where "setup_payloads"."adapter_id" = `,
  templates: `select count(distinct "setup_payloads"."setup_id") from "setup_payloads" where "setup_payloads"."template_id" = `,
};

/**
 * How many setups name an item: a count over an index (setups_*_idx, setup_payloads_*_idx), never
 * a scan. Written out with qualified names: drizzle leaves a single table's columns unqualified,
 * and an unqualified "id" inside the subquery would be the setup's own.
 */
export function setupCountSql(kind: CatalogueKind): SQL<number> {
  return sql<number>`(${sql.raw(`${USAGE[kind]}"${TABLE_NAMES[kind]}"."id"`)})`;
}

async function totalOf(table: SQLiteTable): Promise<number> {
  const [row] = await getDb().select({ n: count() }).from(table);
  return row?.n ?? 0;
}

const offsetOf = (page: number, pageSize: number) => (page - 1) * pageSize;

export async function listModelsPage({ page, pageSize }: { page: number; pageSize: number }) {
  const rows = await getDb()
    .select({ model: envelopeModels, setupCount: setupCountSql("models") })
    .from(envelopeModels)
    .orderBy(asc(envelopeModels.name), asc(envelopeModels.id))
    .limit(pageSize)
    .offset(offsetOf(page, pageSize));
  return {
    rows: rows.map((r) => ({ ...r.model, setupCount: Number(r.setupCount) })),
    total: await totalOf(envelopeModels),
    page,
    pageSize,
  };
}

export async function getModelById({ id }: { id: string }) {
  const [row] = await getDb()
    .select({ model: envelopeModels, setupCount: setupCountSql("models") })
    .from(envelopeModels)
    .where(eq(envelopeModels.id, id));
  return row ? { ...row.model, setupCount: Number(row.setupCount) } : null;
}

/** Models by name for the unit form's choice: the catalogue's models are few. */
export async function listModelChoices() {
  return getDb()
    .select({ id: envelopeModels.id, name: envelopeModels.name, active: envelopeModels.active, gasVolumeM3: envelopeModels.gasVolumeM3 })
    .from(envelopeModels)
    .orderBy(asc(envelopeModels.name));
}

export async function listUnitsPage({ page, pageSize }: { page: number; pageSize: number }) {
  const rows = await getDb()
    .select({
      unit: envelopeUnits,
      modelName: envelopeModels.name,
      modelVolumeM3: envelopeModels.gasVolumeM3,
      ownerEmail: user.email,
      ownerName: user.name,
      setupCount: setupCountSql("units"),
    })
    .from(envelopeUnits)
    .innerJoin(envelopeModels, eq(envelopeUnits.modelId, envelopeModels.id))
    .leftJoin(user, eq(envelopeUnits.ownerId, user.id))
    .orderBy(asc(envelopeUnits.serial))
    .limit(pageSize)
    .offset(offsetOf(page, pageSize));
  const volumes = new Map(rows.map((r) => [r.unit.modelId, r.modelVolumeM3]));
  const calibrated = await calibrate(
    rows.map((r) => r.unit),
    (id) => volumes.get(id),
  );
  return {
    rows: calibrated.map((unit, i) => ({
      ...unit,
      modelName: rows[i].modelName,
      ownerEmail: rows[i].ownerEmail,
      ownerName: rows[i].ownerName,
      setupCount: Number(rows[i].setupCount),
    })),
    total: await totalOf(envelopeUnits),
    page,
    pageSize,
  };
}

/** One unit with its model, owner and every lift test (newest first), for its Workshop page. */
export async function getUnitById({ id }: { id: string }) {
  const db = getDb();
  const [row] = await db
    .select({
      unit: envelopeUnits,
      model: envelopeModels,
      ownerEmail: user.email,
      ownerName: user.name,
      setupCount: setupCountSql("units"),
    })
    .from(envelopeUnits)
    .innerJoin(envelopeModels, eq(envelopeUnits.modelId, envelopeModels.id))
    .leftJoin(user, eq(envelopeUnits.ownerId, user.id))
    .where(eq(envelopeUnits.id, id));
  if (!row) return null;
  const tests = await db
    .select()
    .from(unitLiftTests)
    .where(eq(unitLiftTests.unitId, id))
    .orderBy(desc(unitLiftTests.testedOn), desc(unitLiftTests.createdAt));
  const latest = latestLiftTest(tests);
  return {
    ...row.unit,
    model: row.model,
    ownerEmail: row.ownerEmail,
    ownerName: row.ownerName,
    setupCount: Number(row.setupCount),
    tests,
    latestTest: latest,
    calibrationFactor: unitCalibrationFactor(row.model.gasVolumeM3, latest),
  };
}

type Simple = "mounts" | "adapters" | "templates";
const SIMPLE_TABLES = { mounts, adapters, templates: payloadTemplates } as const;
type SimpleRow<K extends Simple> = K extends "mounts" ? MountRow : K extends "adapters" ? AdapterRow : PayloadTemplateRow;

/** Mounts, adapters or templates by name, a page at a time, with how many setups use each. */
export async function listSimplePage<K extends Simple>({
  kind,
  page,
  pageSize,
}: {
  kind: K;
  page: number;
  pageSize: number;
}): Promise<Page<SimpleRow<K> & { setupCount: number }>> {
  const table = SIMPLE_TABLES[kind];
  const rows = await getDb()
    .select({ item: table, setupCount: setupCountSql(kind) })
    .from(table)
    .orderBy(asc(table.name), asc(table.id))
    .limit(pageSize)
    .offset(offsetOf(page, pageSize));
  return {
    rows: rows.map((r) => ({ ...(r.item as SimpleRow<K>), setupCount: Number(r.setupCount) })),
    total: await totalOf(table),
    page,
    pageSize,
  };
}

export async function getSimpleById<K extends Simple>({
  kind,
  id,
}: {
  kind: K;
  id: string;
}): Promise<(SimpleRow<K> & { setupCount: number }) | null> {
  const table = SIMPLE_TABLES[kind];
  const [row] = await getDb()
    .select({ item: table, setupCount: setupCountSql(kind) })
    .from(table)
    .where(eq(table.id, id));
  return row ? { ...(row.item as SimpleRow<K>), setupCount: Number(row.setupCount) } : null;
}

/** Every template, for the CSV export (the catalogue's templates are tens, not thousands). */
export async function listAllPayloadTemplates() {
  return getDb().select().from(payloadTemplates).orderBy(asc(payloadTemplates.name));
}
