import { DEMO_ADAPTERS, DEMO_MODELS, DEMO_MOUNTS, DEMO_SETUPS, DEMO_TEMPLATES, DEMO_UNITS } from "../../db/seed-data";
import { demoCalibratedUnit, demoModelRow, demoSetupDraft } from "../../db/seed";
import { toPlannerCatalogue } from "../../components/planner/to-planner-catalogue";
import type { PlannerData } from "../../components/planner/types";

/** Planner data for one of the seeded demo setups, built the way the Planner page builds it. */
export function plannerDataFor(setupId: string): PlannerData {
  const setup = DEMO_SETUPS.find((s) => s.id === setupId);
  if (!setup) throw new Error(`no demo setup ${setupId}`);
  const catalogue = toPlannerCatalogue({
    models: DEMO_MODELS.map((m) => demoModelRow(m) as Parameters<typeof toPlannerCatalogue>[0]["models"][number]),
    units: DEMO_UNITS.filter((u) => u.ownerId === setup.ownerId).map(demoCalibratedUnit),
    mounts: DEMO_MOUNTS.map((m) => ({ ...m })),
    adapters: DEMO_ADAPTERS.map((a) => ({ ...a })),
    templates: DEMO_TEMPLATES.map((t) => ({ ...t })),
  });
  const model = catalogue.models.find((m) => m.id === setup.modelId)!;
  return {
    setupId,
    version: 1,
    status: setup.status,
    draft: demoSetupDraft(setup, model.railStartXM, model.railEndXM),
    unitSystem: "metric",
    catalogue,
  };
}
