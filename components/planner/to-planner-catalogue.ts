import type { PlannerAdapter, PlannerCatalogue, PlannerModel, PlannerMount, PlannerTemplate, PlannerUnit } from "./types";

// Database rows carry more than the Planner needs (timestamps, owners, flags): pass on only the
// fields it uses, as plain objects the server page can hand to a client component.

type ModelRowLike = PlannerModel & Record<string, unknown>;
/** A unit row as db/queries/catalogue.ts answers it: with its latest lift test and calibration. */
type UnitRowLike = Omit<PlannerUnit, "testedGrossLiftKg" | "testedOn"> & {
  latestTest: { measuredGrossLiftKg: number; testedOn: string } | null;
} & Record<string, unknown>;

export function toPlannerModel(row: ModelRowLike): PlannerModel {
  return {
    id: row.id,
    name: row.name,
    slug: row.slug,
    glbPath: row.glbPath,
    railTabCount: row.railTabCount,
    gasVolumeM3: row.gasVolumeM3,
    nominalMassKg: row.nominalMassKg,
    buoyancyCentreXM: row.buoyancyCentreXM,
    buoyancyCentreZM: row.buoyancyCentreZM,
    massCentreXM: row.massCentreXM,
    massCentreZM: row.massCentreZM,
    tetherPointXM: row.tetherPointXM,
    tetherPointZM: row.tetherPointZM,
    railStartXM: row.railStartXM,
    railEndXM: row.railEndXM,
    railZM: row.railZM,
    hullJson: row.hullJson,
    aeroJson: row.aeroJson ?? null,
    limitsJson: row.limitsJson ?? null,
    active: row.active ?? true,
  };
}

export function toPlannerCatalogue(rows: {
  models: ModelRowLike[];
  units: UnitRowLike[];
  mounts: (PlannerMount & Record<string, unknown>)[];
  adapters: (PlannerAdapter & Record<string, unknown>)[];
  templates: (PlannerTemplate & Record<string, unknown>)[];
}): PlannerCatalogue {
  return {
    models: rows.models.map(toPlannerModel),
    units: rows.units.map((u) => ({
      id: u.id,
      modelId: u.modelId,
      serial: u.serial,
      measuredMassKg: u.measuredMassKg,
      calibrationFactor: u.calibrationFactor,
      testedGrossLiftKg: u.latestTest?.measuredGrossLiftKg ?? null,
      testedOn: u.latestTest?.testedOn ?? null,
      active: u.active ?? true,
    })),
    mounts: rows.mounts.map((m) => ({
      id: m.id,
      name: m.name,
      thread: m.thread,
      massKg: m.massKg,
      ratedLoadKg: m.ratedLoadKg,
      safetyLineBreakingLoadN: m.safetyLineBreakingLoadN,
      active: m.active ?? true,
    })),
    adapters: rows.adapters.map((a) => ({
      id: a.id,
      name: a.name,
      fromThread: a.fromThread,
      toThread: a.toThread,
      massKg: a.massKg,
      active: a.active ?? true,
    })),
    templates: rows.templates.map((t) => ({
      id: t.id,
      name: t.name,
      description: t.description,
      category: t.category,
      massKg: t.massKg,
      shape: t.shape,
      lengthM: t.lengthM,
      widthM: t.widthM,
      heightM: t.heightM,
      attachment: t.attachment,
      dragAreaM2: t.dragAreaM2,
      offsetXM: t.offsetXM,
      offsetZM: t.offsetZM,
      active: t.active ?? true,
    })),
  };
}
