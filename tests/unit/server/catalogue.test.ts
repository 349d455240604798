import { mkdtempSync, readFileSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openDatabase, type Database } from "@/db/index";
import { MIGRATIONS_FOLDER, migrateDatabase } from "@/db/migrate";
import { catalogueIdsOfDraft, getPlannerCatalogue } from "@/db/queries/catalogue";
import { getSetupById } from "@/db/queries/setups";
import * as t from "@/db/schema";
import { seedDemo } from "@/db/seed";
import { DEMO_LIFT_TESTS, DEMO_UNITS } from "@/db/seed-data";
import type { Viewer } from "@/lib/auth/access";
import { calibrationFactor } from "@/lib/balance";
import { templatesToCsv } from "@/lib/catalogue/templates-csv";
import * as catalogue from "@/lib/server/catalogue";
import { evaluateDraft } from "@/lib/server/evaluate-draft";
import { createSetup, saveSetup } from "@/lib/server/setups";

// The Workshop's core against a real SQLite file with the invented demo seeded.

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-workshop-"));
let db: Database;
let close: () => void;

const MAKER: Viewer = { id: "usr-maker-1", name: "Hedda Marlowe", email: "maker@trimrail.test", role: "maker", unitSystem: "metric" };
const WREN: Viewer = {
  id: "usr-customer-1",
  name: "Wren Halloway",
  email: "customer@trimrail.test",
  role: "customer",
  unitSystem: "metric",
};
/** Wren's whip setup flies on her serial unit R11-0007. */
const WHIP_SETUP = "set-wren-whip";

beforeAll(async () => {
  const opened = openDatabase(`file:${path.join(dir, "workshop.db")}`);
  db = opened.db;
  close = () => opened.client.close();
  await migrateDatabase(db);
  await seedDemo(db);
  (globalThis as { trimrailDb?: Database }).trimrailDb = db;
});
afterAll(() => {
  close();
  delete (globalThis as { trimrailDb?: Database }).trimrailDb;
  rmSync(dir, { recursive: true, force: true });
});

async function draftOf(id: string) {
  const stored = await getSetupById({ id, ownerId: null });
  if (!stored) throw new Error(`no setup ${id}`);
  return stored;
}

async function grossLiftOf(draft: Awaited<ReturnType<typeof draftOf>>["draft"], ownerId = WREN.id): Promise<number> {
  const evaluated = await evaluateDraft({ draft, ownerId });
  if (!evaluated.ok) throw new Error(evaluated.error.message);
  return evaluated.data.result.grossLiftKg;
}

describe("the first-weighing backfill of the workshop migration", () => {
  it("returns each unit's single weighing as its first lift test", async () => {
    const sql = readFileSync(path.join(MIGRATIONS_FOLDER, "0003_workshop.sql"), "utf8");
    const backfill = sql.slice(sql.indexOf("INSERT INTO `unit_lift_tests`"));
    const { client, db: fresh } = openDatabase(`file:${path.join(dir, "backfill.db")}`);
    await migrateDatabase(fresh);
    await seedDemo(fresh);
    await client.execute("delete from unit_lift_tests");
    await client.execute(backfill);
    const rows = (
      await client.execute(
        "select unit_id, measured_gross_lift_kg, temperature_c, altitude_m, pressure_pa, purity, tested_on from unit_lift_tests order by unit_id",
      )
    ).rows;
    expect(rows.map((r) => ({ ...r }))).toEqual(
      [...DEMO_UNITS]
        .sort((a, b) => a.id.localeCompare(b.id))
        .map((u) => ({
          unit_id: u.id,
          measured_gross_lift_kg: u.measuredGrossLiftKg,
          temperature_c: u.measuredAtTemperatureC,
          altitude_m: u.measuredAtAltitudeM,
          pressure_pa: null,
          purity: 1,
          tested_on: u.measuredOn,
        })),
    );
    // Running it again adds nothing: a unit that has a test keeps its history as it is.
    await client.execute(backfill);
    expect((await client.execute("select count(*) as n from unit_lift_tests")).rows[0].n).toBe(DEMO_UNITS.length);
    client.close();
  }, 60_000);
});

describe("a serial unit's calibration", () => {
  it("returns a setup's gross lift scaled by the unit's factor when the setup names the unit", async () => {
    const { draft } = await draftOf(WHIP_SETUP);
    const unit = await catalogue.getEnvelopeUnit({ viewer: MAKER, id: "unit-r11-0007" });
    if (!unit.ok) throw new Error("no unit");
    const factor = unit.data.calibrationFactor!;
    const first = DEMO_LIFT_TESTS.find((x) => x.id === "lt-unit-r11-0007-first")!;
    expect(factor).toBeCloseTo(
      calibrationFactor(unit.data.model.gasVolumeM3, {
        measuredGrossLiftKg: first.measuredGrossLiftKg,
        temperatureC: first.temperatureC,
        altitudeM: first.altitudeM,
        purity: first.purity,
      }),
      12,
    );
    const withUnit = await grossLiftOf(draft);
    const withoutUnit = await grossLiftOf({ ...draft, unitId: null });
    expect(withUnit / withoutUnit).toBeCloseTo(factor, 10);
  });

  it("returns the newest lift test's factor after a test is recorded, and the setup follows it", async () => {
    const { draft } = await draftOf(WHIP_SETUP);
    const before = await grossLiftOf(draft);
    const recorded = await catalogue.addUnitLiftTest({
      viewer: MAKER,
      unitId: "unit-r11-0007",
      values: {
        measuredGrossLiftKg: 1.02,
        temperatureC: 15,
        pressurePa: 101_325,
        altitudeM: 0,
        purity: 1,
        testedOn: "2026-11-28",
        notes: "after a patch",
      },
    });
    if (!recorded.ok) throw new Error(recorded.error.message);
    const model = await catalogue.getEnvelopeModel({ viewer: MAKER, id: "mdl-ridge-11" });
    if (!model.ok) throw new Error("no model");
    const expected = calibrationFactor(model.data.gasVolumeM3, {
      measuredGrossLiftKg: 1.02,
      temperatureC: 15,
      pressurePa: 101_325,
      purity: 1,
    });
    expect(recorded.data.calibrationFactor).toBeCloseTo(expected, 12);
    const after = await grossLiftOf(draft);
    const withoutUnit = await grossLiftOf({ ...draft, unitId: null });
    expect(after / withoutUnit).toBeCloseTo(expected, 10);
    expect(after).not.toBeCloseTo(before, 3);
    // Removing it goes back to the first weighing.
    expect((await catalogue.removeUnitLiftTest({ viewer: MAKER, unitId: "unit-r11-0007", testId: recorded.data.id })).ok).toBe(true);
    expect(await grossLiftOf(draft)).toBeCloseTo(before, 12);
  });

  it("refuses a lift test dated in the future, writing nothing", async () => {
    const refused = await catalogue.addUnitLiftTest({
      viewer: MAKER,
      unitId: "unit-r11-0007",
      values: { measuredGrossLiftKg: 1, temperatureC: 15, pressurePa: null, altitudeM: 0, purity: 1, testedOn: "2999-01-01", notes: "" },
    });
    expect(!refused.ok && refused.error.issues).toEqual([{ path: "testedOn", message: "after today" }]);
    expect(await db.select().from(t.unitLiftTests).where(eq(t.unitLiftTests.testedOn, "2999-01-01"))).toEqual([]);
  });
});

describe("editing the catalogue", () => {
  it("returns the new figures in a setup that names an edited model and mount", async () => {
    const { draft } = await draftOf("set-tobin-draft");
    const before = await evaluateDraft({ draft, ownerId: "usr-customer-2" });
    const model = await catalogue.getEnvelopeModel({ viewer: MAKER, id: draft.modelId });
    if (!model.ok || !before.ok) throw new Error("setup");
    const m = model.data;
    const saved = await catalogue.saveEnvelopeModel({
      viewer: MAKER,
      id: m.id,
      values: {
        slug: m.slug,
        name: m.name,
        description: m.description,
        hull: { ...m.hullJson, lengthM: m.hullJson.lengthM * 1.05 },
        nominalMassKg: m.nominalMassKg + 0.1,
        massCentreXM: m.massCentreXM,
        massCentreZM: m.massCentreZM,
        tetherPointXM: m.tetherPointXM,
        tetherPointZM: m.tetherPointZM,
        railStartXM: m.railStartXM,
        railEndXM: m.railEndXM,
        railZM: m.railZM,
        railTabCount: m.railTabCount,
        aero: m.aeroJson,
        limits: m.limitsJson,
      },
    });
    expect(saved.ok).toBe(true);
    const edited = await catalogue.getEnvelopeModel({ viewer: MAKER, id: m.id });
    if (!edited.ok) throw new Error("model");
    expect(edited.data.gasVolumeM3).toBeGreaterThan(m.gasVolumeM3 * 1.04);
    expect(edited.data.glbPath).toBe(`/api/catalogue/models/${m.id}/envelope.glb`);
    const after = await evaluateDraft({ draft, ownerId: "usr-customer-2" });
    if (!after.ok) throw new Error("after");
    expect(after.data.result.totalMassKg - before.data.result.totalMassKg).toBeCloseTo(0.1, 10);
    expect(after.data.result.grossLiftKg).toBeGreaterThan(before.data.result.grossLiftKg);
  });

  it("refuses a model whose rail ends aft of the hull, with the field at fault", async () => {
    const { envelopeModelValuesSchema } = await import("@/lib/catalogue/schemas");
    const m = (await catalogue.getEnvelopeModel({ viewer: MAKER, id: "mdl-ridge-06" })) as {
      ok: true;
      data: { hullJson: { lengthM: number } } & Record<string, unknown>;
    };
    const parsed = envelopeModelValuesSchema.safeParse({
      slug: "x-1",
      name: "X",
      description: "",
      hull: m.data.hullJson,
      nominalMassKg: 0.3,
      massCentreXM: 0.7,
      massCentreZM: 0,
      tetherPointXM: 0.6,
      tetherPointZM: -0.7,
      railStartXM: 0.5,
      railEndXM: m.data.hullJson.lengthM + 0.1,
      railZM: -0.4,
      railTabCount: 7,
      aero: null,
      limits: {},
    });
    expect(parsed.success).toBe(false);
    expect(parsed.error?.issues.map((i) => i.path.join("."))).toContain("railEndXM");
  });
});

describe("retiring", () => {
  it("returns the retired model only to a setup that names it, and refuses it for a new setup", async () => {
    expect((await catalogue.setCatalogueItemActive({ viewer: MAKER, kind: "models", id: "mdl-ridge-06", active: false })).ok).toBe(true);
    const fresh = await getPlannerCatalogue({ ownerId: WREN.id });
    expect(fresh.models.map((m) => m.id)).not.toContain("mdl-ridge-06");
    expect(fresh.units.map((u) => u.id)).toContain("unit-r06-0012"); // the unit itself is not retired
    const old = await draftOf("set-wren-strobe");
    const forOld = await getPlannerCatalogue({ ownerId: WREN.id, includeIds: catalogueIdsOfDraft(old.draft) });
    expect(forOld.models.find((m) => m.id === "mdl-ridge-06")?.active).toBe(false);

    // The old setup still evaluates and saves.
    const saved = await saveSetup({
      viewer: WREN,
      id: "set-wren-heavy",
      version: (await draftOf("set-wren-heavy")).row.version,
      draft: (await draftOf("set-wren-heavy")).draft,
    });
    expect(saved.ok).toBe(true);
    // A new one cannot start on it, neither by model nor by a copied draft.
    const byModel = await createSetup({ viewer: WREN, input: { modelId: "mdl-ridge-06" } });
    expect(!byModel.ok && byModel.error.code).toBe("bad_request");
    const byDraft = await createSetup({ viewer: WREN, input: { draft: old.draft } });
    expect(!byDraft.ok && byDraft.error.issues).toEqual([{ path: "draft.modelId", message: "retired envelope model" }]);
    expect((await catalogue.setCatalogueItemActive({ viewer: MAKER, kind: "models", id: "mdl-ridge-06", active: true })).ok).toBe(true);
  });

  it("refuses to delete an item setups use and deletes one nobody uses", async () => {
    const used = await catalogue.deleteCatalogueItem({ viewer: MAKER, kind: "mounts", id: "mnt-slider-14" });
    expect(!used.ok && used.error.code).toBe("conflict");
    expect(!used.ok && used.error.message).toMatch(/retire it instead/);
    const added = await catalogue.saveCatalogueItem({
      viewer: MAKER,
      kind: "adapters",
      id: null,
      values: { name: "Spare bush", fromThread: "strap", toThread: "3/8-16 UNC", massKg: 0.02, ratedLoadKg: 1 },
    });
    if (!added.ok) throw new Error(added.error.message);
    expect((await catalogue.deleteCatalogueItem({ viewer: MAKER, kind: "adapters", id: added.data.id })).ok).toBe(true);
    expect(await db.select().from(t.adapters).where(eq(t.adapters.id, added.data.id))).toEqual([]);
  });

  it("returns a used-by count per item from the paged list", async () => {
    const page = await catalogue.listCatalogue({ viewer: MAKER, kind: "mounts", page: 1 });
    if (!page.ok) throw new Error("list");
    const counts = Object.fromEntries((page.data.rows as { id: string; setupCount: number }[]).map((r) => [r.id, r.setupCount]));
    const rows = await db.select({ mountId: t.setups.mountId }).from(t.setups);
    const reference: Record<string, number> = {};
    for (const r of rows) reference[r.mountId] = (reference[r.mountId] ?? 0) + 1;
    expect(counts).toEqual(reference);
  });
});

describe("importTemplatesCsv", () => {
  const templatesNow = () => db.select().from(t.payloadTemplates).orderBy(t.payloadTemplates.id);

  it("writes nothing when one row is bad, and names its row and column", async () => {
    const before = await templatesNow();
    const csv =
      templatesToCsv(before).replace(/\r\n$/, "") +
      "\r\n,New light,,light,0.03,cylinder,0.03,0.03,0.05,1/4-20 UNC,0.002,0,-0.06\r\n,Broken,,light,lots,box,0.1,0.1,0.1,strap,0,0,-0.1";
    const result = await catalogue.importTemplatesCsv({ viewer: MAKER, csv });
    expect(!result.ok && result.error.code).toBe("unprocessable");
    expect(!result.ok && result.error.issues).toEqual([{ path: `row ${before.length + 3}.mass_kg`, message: '"lots" is not a number' }]);
    expect(await templatesNow()).toEqual(before);
  });

  it("writes nothing when a new row takes another template's name (found inside the transaction)", async () => {
    const before = await templatesNow();
    const csv = `${templatesToCsv([]).trim()}\r\n,Fresh one,,light,0.03,cylinder,0.03,0.03,0.05,1/4-20 UNC,0.002,0,-0.06\r\n,White strobe,,light,0.03,cylinder,0.03,0.03,0.05,1/4-20 UNC,0.002,0,-0.06`;
    const result = await catalogue.importTemplatesCsv({ viewer: MAKER, csv });
    expect(!result.ok && result.error.issues).toEqual([{ path: "row 3.name", message: "another template already has this name" }]);
    expect(await templatesNow()).toEqual(before);
  });

  it("round-trips: an exported file imports as updates that change nothing", async () => {
    const before = await templatesNow();
    const exported = await catalogue.exportTemplatesCsv({ viewer: MAKER });
    if (!exported.ok || !(exported.data.bytes instanceof Uint8Array)) throw new Error("export");
    const result = await catalogue.importTemplatesCsv({ viewer: MAKER, csv: new TextDecoder().decode(exported.data.bytes) });
    expect(result).toEqual({ ok: true, data: { created: 0, updated: before.length } });
    expect(await templatesNow()).toEqual(before);
  });
});

describe("saveEnvelopeUnit", () => {
  it("refuses to give a unit that setups name to another owner, writing nothing", async () => {
    const refused = await catalogue.saveEnvelopeUnit({
      viewer: MAKER,
      id: "unit-r11-0007",
      values: { serial: "R11-0007", modelId: "mdl-ridge-11", ownerEmail: "tobin@trimrail.test", measuredMassKg: 0.474, notes: "" },
    });
    expect(!refused.ok && refused.error.issues?.[0].path).toBe("ownerEmail");
    const [row] = await db.select().from(t.envelopeUnits).where(eq(t.envelopeUnits.id, "unit-r11-0007"));
    expect(row.ownerId).toBe(WREN.id);
  });

  it("adds a unit for a customer by e-mail and refuses an e-mail that is no customer's", async () => {
    const added = await catalogue.saveEnvelopeUnit({
      viewer: MAKER,
      id: null,
      values: { serial: "R06-0099", modelId: "mdl-ridge-06", ownerEmail: "mirela@trimrail.test", measuredMassKg: 0.26, notes: "" },
    });
    expect(added.ok).toBe(true);
    const unit = added.ok ? await catalogue.getEnvelopeUnit({ viewer: MAKER, id: added.data.id }) : null;
    expect(unit?.ok && unit.data.calibrationFactor).toBeNull();
    const bad = await catalogue.saveEnvelopeUnit({
      viewer: MAKER,
      id: null,
      values: { serial: "R06-0100", modelId: "mdl-ridge-06", ownerEmail: "support@trimrail.test", measuredMassKg: 0.26, notes: "" },
    });
    expect(!bad.ok && bad.error.issues).toEqual([{ path: "ownerEmail", message: "no customer has that e-mail" }]);
  });
});
