import { hashPassword } from "better-auth/crypto";
import { eq } from "drizzle-orm";
import { deriveEnvelopeGeometry, demoHulls, evaluateBalance, worstLevel, type DemoHullName } from "@/lib/balance";
import { DEFAULT_WIND_MEASUREMENT } from "@/lib/domain";
import { toBalanceInput, type SetupCatalogue } from "@/lib/setups/balance-input";
import { latestLiftTest, unitCalibrationFactor } from "@/lib/setups/calibration";
import type { SetupDraft } from "@/lib/setups/setup-draft";
import { columnsFromDraft, payloadRowsFromDraft, resultRows, summaryColumns } from "./setup-columns";
import type { Database } from "./index";
import * as t from "./schema";
import {
  DEMO_ADAPTERS,
  DEMO_LIFT_TESTS,
  DEMO_MODELS,
  DEMO_MOUNTS,
  DEMO_PASSWORD,
  DEMO_REVIEWS,
  DEMO_SETUPS,
  DEMO_TEMPLATES,
  DEMO_TETHER,
  DEMO_UNITS,
  DEMO_USERS,
  type DemoSetup,
} from "./seed-data";

const DAY_MS = 86_400_000;
// Fixed "now" so a second run on another day still writes identical rows.
const SEED_EPOCH_MS = Date.UTC(2026, 10, 30, 12, 0, 0);

export type SeedCounts = Record<"users" | "models" | "units" | "mounts" | "adapters" | "templates" | "setups", number>;

export function demoModelRow(m: (typeof DEMO_MODELS)[number]): typeof t.envelopeModels.$inferInsert {
  const hull = demoHulls[m.hullKey as DemoHullName];
  const g = deriveEnvelopeGeometry(hull);
  return {
    id: m.id,
    slug: m.slug,
    name: m.name,
    description: m.description,
    hullJson: hull,
    gasVolumeM3: g.gasVolumeM3,
    nominalMassKg: m.nominalMassKg,
    buoyancyCentreXM: g.buoyancyCentre.x,
    buoyancyCentreZM: g.buoyancyCentre.z,
    massCentreXM: g.fabricMassCentre.x,
    massCentreZM: g.fabricMassCentre.z,
    tetherPointXM: g.tetherPoint.x,
    tetherPointZM: g.tetherPoint.z,
    railStartXM: g.rail.startX,
    railEndXM: g.rail.endX,
    railZM: g.rail.z,
    railTabCount: m.railTabCount,
    aeroJson: g.aero,
    limitsJson: {},
    glbPath: `/models/${m.slug}.glb`,
    createdAt: new Date(SEED_EPOCH_MS - 400 * DAY_MS),
    updatedAt: new Date(SEED_EPOCH_MS - 400 * DAY_MS),
  };
}

const LIFT_TESTS_AT = new Date(SEED_EPOCH_MS - 100 * DAY_MS);

/** A demo unit as the catalogue queries answer it: with its latest lift test and calibration factor. */
export function demoCalibratedUnit(u: (typeof DEMO_UNITS)[number]) {
  const model = DEMO_MODELS.find((m) => m.id === u.modelId);
  if (!model) throw new Error(`seed: unit ${u.id} names an unknown model`);
  const tests = DEMO_LIFT_TESTS.filter((t) => t.unitId === u.id).map((t) => ({ ...t, createdAt: LIFT_TESTS_AT }));
  const latestTest = latestLiftTest(tests);
  return { ...u, active: true, latestTest, calibrationFactor: unitCalibrationFactor(demoModelRow(model).gasVolumeM3, latestTest) };
}

export function demoSetupDraft(s: DemoSetup, railStartXM: number, railEndXM: number): SetupDraft {
  return {
    name: s.name,
    modelId: s.modelId,
    unitId: s.unitId,
    mountId: s.mountId,
    mountPositionXM: railStartXM + s.railFraction * (railEndXM - railStartXM),
    site: {
      siteName: s.siteName,
      altitudeM: s.altitudeM,
      temperatureC: s.temperatureC,
      pressurePa: null,
      windMS: s.windMS,
      gustMS: s.gustMS,
      windMeasuredAtM: s.windMeasuredAtM ?? DEFAULT_WIND_MEASUREMENT.windMeasuredAtM,
      windShearExponent: DEFAULT_WIND_MEASUREMENT.windShearExponent,
      relativeHumidity: s.relativeHumidity ?? null,
    },
    gas: { purity: s.purity, superheatK: 0, fillFraction: 1 },
    tether: {
      massPerMetreKg: DEMO_TETHER.tetherMassPerMetreKg,
      lengthOutM: s.tetherLengthOutM,
      breakingLoadN: DEMO_TETHER.tetherBreakingLoadN,
      diameterM: DEMO_TETHER.tetherDiameterM,
    },
    targetHeightM: s.targetHeightM ?? null,
    payloads: s.payloads.map((p) => {
      const tpl = DEMO_TEMPLATES.find((x) => x.id === p.templateId);
      if (!tpl) throw new Error(`seed: unknown template ${p.templateId}`);
      return {
        templateId: tpl.id,
        name: tpl.name,
        category: tpl.category,
        massKg: tpl.massKg,
        shape: tpl.shape,
        lengthM: tpl.lengthM,
        widthM: tpl.widthM,
        heightM: tpl.heightM,
        attachment: tpl.attachment,
        adapterId: p.adapterId ?? null,
        dragAreaM2: tpl.dragAreaM2,
        offsetXM: tpl.offsetXM + (p.extraOffsetXM ?? 0),
        offsetZM: tpl.offsetZM,
      };
    }),
  };
}

/**
 * Builds the invented demo scenario. Idempotent: every row has a fixed id and is inserted only when
 * missing, so a second run changes nothing (and keeps whatever a person changed in the demo).
 */
export async function seedDemo(db: Database): Promise<SeedCounts> {
  for (const u of DEMO_USERS) {
    const [existing] = await db.select({ id: t.user.id }).from(t.user).where(eq(t.user.email, u.email));
    if (existing) continue;
    const at = new Date(SEED_EPOCH_MS - 365 * DAY_MS);
    await db.transaction(async (tx) => {
      await tx
        .insert(t.user)
        .values({ id: u.id, name: u.name, email: u.email, emailVerified: true, role: u.role, createdAt: at, updatedAt: at });
      await tx.insert(t.account).values({
        id: `acc-${u.id}`,
        accountId: u.id,
        providerId: "credential",
        userId: u.id,
        password: await hashPassword(DEMO_PASSWORD),
        createdAt: at,
        updatedAt: at,
      });
    });
  }

  const models = DEMO_MODELS.map(demoModelRow);
  await db.insert(t.envelopeModels).values(models).onConflictDoNothing();
  await db
    .insert(t.envelopeUnits)
    .values(DEMO_UNITS.map((u) => ({ ...u, createdAt: new Date(SEED_EPOCH_MS - 100 * DAY_MS) })))
    .onConflictDoNothing();
  await db
    .insert(t.unitLiftTests)
    .values(DEMO_LIFT_TESTS.map((lt) => ({ ...lt, createdAt: LIFT_TESTS_AT })))
    .onConflictDoNothing();
  await db
    .insert(t.mounts)
    .values([...DEMO_MOUNTS])
    .onConflictDoNothing();
  await db
    .insert(t.adapters)
    .values([...DEMO_ADAPTERS])
    .onConflictDoNothing();
  await db
    .insert(t.payloadTemplates)
    .values([...DEMO_TEMPLATES])
    .onConflictDoNothing();

  const adaptersById = Object.fromEntries(DEMO_ADAPTERS.map((a) => [a.id, a]));
  for (const s of DEMO_SETUPS) {
    const model = models.find((m) => m.id === s.modelId);
    const mount = DEMO_MOUNTS.find((m) => m.id === s.mountId);
    if (!model || !mount) throw new Error(`seed: setup ${s.id} names an unknown model or mount`);
    const demoUnit = s.unitId ? DEMO_UNITS.find((u) => u.id === s.unitId) : undefined;
    const unit = demoUnit ? demoCalibratedUnit(demoUnit) : null;
    const draft = demoSetupDraft(s, model.railStartXM, model.railEndXM);
    const catalogue: SetupCatalogue = { model: model as SetupCatalogue["model"], unit, mount, adaptersById };
    const result = evaluateBalance(toBalanceInput(draft, catalogue));
    const at = new Date(SEED_EPOCH_MS - s.daysAgo * DAY_MS);
    await db.transaction(async (tx) => {
      const inserted = await tx
        .insert(t.setups)
        .values({
          id: s.id,
          ownerId: s.ownerId,
          ...columnsFromDraft(draft),
          ...summaryColumns(draft, result),
          status: s.status,
          worstFlag: worstLevel(result.flags),
          cautionsAcknowledged: s.status !== "draft",
          submittedAt: s.status === "draft" ? null : new Date(at.getTime() - DAY_MS / 2),
          createdAt: new Date(at.getTime() - DAY_MS),
          updatedAt: at,
        })
        .onConflictDoNothing()
        .returning({ id: t.setups.id });
      if (inserted.length === 0) return;
      const stored = resultRows(s.id, result);
      await tx.insert(t.setupResults).values(stored.result);
      if (stored.flags.length) await tx.insert(t.setupFlags).values(stored.flags);
      if (draft.payloads.length) await tx.insert(t.setupPayloads).values(payloadRowsFromDraft(s.id, draft, (i) => `${s.id}-p${i}`));
    });
  }

  for (const r of DEMO_REVIEWS) {
    const setup = DEMO_SETUPS.find((s) => s.id === r.setupId);
    if (!setup) throw new Error(`seed: review of unknown setup ${r.setupId}`);
    const at = new Date(SEED_EPOCH_MS - setup.daysAgo * DAY_MS + DAY_MS / 4);
    await db
      .insert(t.comments)
      .values({ id: `cmt-${r.setupId}`, setupId: r.setupId, authorId: r.reviewerId, body: r.comment, createdAt: at })
      .onConflictDoNothing();
    await db
      .insert(t.decisions)
      .values({
        id: `dec-${r.setupId}`,
        setupId: r.setupId,
        reviewerId: r.reviewerId,
        outcome: setup.status === "approved" ? "approved" : "changes_requested",
        setupVersion: 1,
        reasonsJson: r.reasons,
        note: r.note,
        createdAt: at,
      })
      .onConflictDoNothing();
  }

  return {
    users: DEMO_USERS.length,
    models: DEMO_MODELS.length,
    units: DEMO_UNITS.length,
    mounts: DEMO_MOUNTS.length,
    adapters: DEMO_ADAPTERS.length,
    templates: DEMO_TEMPLATES.length,
    setups: DEMO_SETUPS.length,
  };
}
