import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { installDerivedTables } from "@/db/derived-tables";
import { openDatabase, type Database } from "@/db/index";
import { migrateDatabase } from "@/db/migrate";
import { getSetupById } from "@/db/queries/setups";
import type { InsightFilter } from "@/db/queries/insight";
import * as t from "@/db/schema";
import { seedDemo } from "@/db/seed";
import type { Viewer } from "@/lib/auth/access";
import { getInsight } from "@/lib/server/insight";
import { decideOnSetup } from "@/lib/server/review";
import { createSetup, deleteSetup, duplicateSetup, saveSetup, submitSetup } from "@/lib/server/setups";
import { insightFromBaseTables } from "./insight-reference";

// Insight's roll-ups, kept by triggers, against a fresh GROUP BY over the base tables after writes
// through the app's own core functions, and against a recount from scratch (the migration's backfill).

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-rollups-"));
let db: Database;
let client: ReturnType<typeof openDatabase>["client"];

const WREN: Viewer = {
  id: "usr-customer-1",
  name: "Wren Halloway",
  email: "customer@trimrail.test",
  role: "customer",
  unitSystem: "metric",
};
const SUPPORT: Viewer = {
  id: "usr-support-1",
  name: "Sunniva Rook",
  email: "support@trimrail.test",
  role: "support",
  unitSystem: "metric",
};

const today = new Date().toISOString().slice(0, 10);
const FILTERS: Array<[string, InsightFilter]> = [
  ["no filter", { modelId: null, from: null, to: null }],
  ["each model", { modelId: "mdl-ridge-11", from: null, to: null }],
  ["another model", { modelId: "mdl-ridge-18", from: null, to: null }],
  ["today", { modelId: null, from: today, to: today }],
  ["from a day in a month on", { modelId: null, from: "2026-10-14", to: null }],
  ["whole months and parts of others", { modelId: "mdl-ridge-11", from: "2026-09-30", to: "2026-11-02" }],
  ["across a new year", { modelId: null, from: "2025-12-31", to: "2027-01-01" }],
];

beforeAll(async () => {
  const opened = openDatabase(`file:${path.join(dir, "rollups.db")}`);
  db = opened.db;
  client = opened.client;
  await migrateDatabase(db);
  await seedDemo(db);
  (globalThis as { trimrailDb?: Database }).trimrailDb = db;
});
afterAll(() => {
  client.close();
  delete (globalThis as { trimrailDb?: Database }).trimrailDb;
  rmSync(dir, { recursive: true, force: true });
});

const rollupRows = async () =>
  (await client.execute("select * from insight_rollups order by measure, span, first_day, model_id, status, bin, label, level")).rows.map(
    (r) => ({ ...r }),
  );

async function expectRollupsToMatchBaseTables() {
  for (const [label, filter] of FILTERS) {
    const got = await getInsight({ filter });
    if (!got.ok) throw new Error(got.error.message);
    expect(got.data, label).toEqual(await insightFromBaseTables(db, filter));
  }
  // And the rows themselves equal a recount from scratch.
  const kept = await rollupRows();
  await installDerivedTables(db, { force: true });
  expect(await rollupRows()).toEqual(kept);
}

async function draftOf(id: string) {
  const stored = await getSetupById({ id, ownerId: null });
  if (!stored) throw new Error(`no setup ${id}`);
  return stored;
}

describe("Insight's roll-ups", () => {
  it("equal a fresh GROUP BY over the demo as seeded", async () => {
    await expectRollupsToMatchBaseTables();
    expect(Number((await client.execute("select count(*) as n from insight_rollups")).rows[0].n)).toBeGreaterThan(0);
  });

  it("stay equal to it through create, saves with changed payloads, submit, a decision, duplicate, delete and a moved rail", async () => {
    const base = await draftOf("set-wren-whip");
    const created = await createSetup({ viewer: WREN, input: { draft: { ...base.draft, name: "Rollup check at the quarry edge" } } });
    if (!created.ok) throw new Error(created.error.message);
    const id = created.data.id;
    await expectRollupsToMatchBaseTables();

    // Another model, mount position and payloads: every measure of the setup moves.
    const ridge18 = (await db.select().from(t.envelopeModels).where(eq(t.envelopeModels.id, "mdl-ridge-18")))[0];
    const saved = await saveSetup({
      viewer: WREN,
      id,
      version: 1,
      draft: {
        ...base.draft,
        modelId: ridge18.id,
        unitId: null,
        mountPositionXM: (ridge18.railStartXM + ridge18.railEndXM) / 2,
        // The same payloads twice, the second time heavier: new mass bins, templates counted twice.
        payloads: [...base.draft.payloads, ...base.draft.payloads.map((p) => ({ ...p, massKg: p.massKg + 0.07 }))],
      },
    });
    if (!saved.ok) throw new Error(saved.error.message);
    await expectRollupsToMatchBaseTables();

    // Back to the first model with fewer payloads, then to review.
    const again = await saveSetup({
      viewer: WREN,
      id,
      version: saved.data.version,
      draft: { ...base.draft, payloads: base.draft.payloads.slice(0, 1) },
    });
    if (!again.ok) throw new Error(again.error.message);
    const submitted = await submitSetup({ viewer: WREN, id, version: again.data.version, acknowledgeCautions: true });
    if (!submitted.ok) throw new Error(submitted.error.message);
    await expectRollupsToMatchBaseTables();

    const decided = await decideOnSetup({
      viewer: SUPPORT,
      id,
      decision: "changes_requested",
      reason: "Move the mount forward.",
      reasonCodes: ["other"],
      version: submitted.data.version,
    });
    if (!decided.ok) throw new Error(decided.error.message);
    await expectRollupsToMatchBaseTables();

    const copy = await duplicateSetup({ viewer: WREN, id });
    if (!copy.ok) throw new Error(copy.error.message);
    await expectRollupsToMatchBaseTables();

    // Deleting the reviewed one takes its payloads, flags and decision out with it.
    const deleted = await deleteSetup({ viewer: WREN, id });
    if (!deleted.ok) throw new Error(deleted.error.message);
    expect(await getSetupById({ id, ownerId: null })).toBeNull();
    await expectRollupsToMatchBaseTables();

    // The maker lengthens a model's rail: its setups fall in other tenths of it.
    await db
      .update(t.envelopeModels)
      .set({ railEndXM: sql`${t.envelopeModels.railEndXM} + 0.4` })
      .where(eq(t.envelopeModels.id, "mdl-ridge-11"));
    await expectRollupsToMatchBaseTables();
  });

  it("are rebuilt by the migration for a database that has none", async () => {
    const want = await rollupRows();
    await client.execute("delete from insight_rollups");
    await client.execute("delete from derived_stamps");
    await migrateDatabase(db);
    expect(await rollupRows()).toEqual(want);
    await expectRollupsToMatchBaseTables();
  });
});
