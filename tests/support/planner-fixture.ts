import { DEMO_ADAPTERS, DEMO_MODELS, DEMO_MOUNTS, DEMO_SETUPS, DEMO_TEMPLATES, DEMO_UNITS } from "../../db/seed-data";
import { demoModelRow, demoSetupDraft } from "../../db/seed";
import type { PlannerData } from "../../components/planner/types";

/** Planner data for one of the seeded demo setups, built the way the Planner page builds it. */
export function plannerDataFor(setupId: string): PlannerData {
  const setup = DEMO_SETUPS.find((s) => s.id === setupId);
  if (!setup) throw new Error(`no demo setup ${setupId}`);
  const models = DEMO_MODELS.map((m) => {
    const row = demoModelRow(m);
    return {
      id: row.id, name: row.name, slug: row.slug, glbPath: row.glbPath, railTabCount: row.railTabCount,
      gasVolumeM3: row.gasVolumeM3, nominalMassKg: row.nominalMassKg,
      buoyancyCentreXM: row.buoyancyCentreXM, buoyancyCentreZM: row.buoyancyCentreZM,
      massCentreXM: row.massCentreXM, massCentreZM: row.massCentreZM,
      tetherPointXM: row.tetherPointXM, tetherPointZM: row.tetherPointZM,
      railStartXM: row.railStartXM, railEndXM: row.railEndXM, railZM: row.railZM,
      hullJson: row.hullJson, aeroJson: row.aeroJson ?? null, limitsJson: row.limitsJson ?? null,
    };
  });
  const model = models.find((m) => m.id === setup.modelId)!;
  return {
    setupId,
    version: 1,
    status: setup.status,
    draft: demoSetupDraft(setup, model.railStartXM, model.railEndXM),
    unitSystem: "metric",
    catalogue: {
      models,
      units: DEMO_UNITS.filter((u) => u.ownerId === setup.ownerId),
      mounts: [...DEMO_MOUNTS],
      adapters: DEMO_ADAPTERS.map((a) => ({ ...a })),
      templates: DEMO_TEMPLATES.map((t) => ({ ...t })),
    },
  };
}
