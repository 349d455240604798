import { DEMO_ADAPTERS, DEMO_MODELS, DEMO_MOUNTS, DEMO_SETUPS, DEMO_TEMPLATES, DEMO_UNITS } from "../../db/seed-data";
import { demoCalibratedUnit, demoModelRow, demoSetupDraft } from "../../db/seed";
import { toPlannerCatalogue } from "../../components/planner/to-planner-catalogue";
import type { PlannerData } from "../../components/planner/types";
import type { SetupDraft } from "../../lib/setups/setup-draft";
import type { ApiClient } from "./http";

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

/**
 * A new setup of the signed-in customer's, made over the API from a seeded demo draft (without a
 * serial unit, which belongs to the demo's owner), so that a test may edit and save it freely.
 */
export async function createSetupFrom(
  api: ApiClient,
  demoSetupId: string,
  name: string,
  patch: Partial<SetupDraft> = {},
): Promise<{ id: string; draft: SetupDraft }> {
  const draft: SetupDraft = { ...plannerDataFor(demoSetupId).draft, name, unitId: null, ...patch };
  const response = await api.request("POST", "/api/setups", { draft });
  if (response.status !== 201) throw new Error(`creating a setup answered ${response.status}: ${await response.text()}`);
  const { id } = (await response.json()) as { id: string };
  return { id, draft };
}

/** The setup as stored, read over the API. */
export async function storedSetup(api: ApiClient, id: string): Promise<{ version: number; draft: SetupDraft }> {
  const response = await api.request("GET", `/api/setups/${id}`);
  if (response.status !== 200) throw new Error(`reading setup ${id} answered ${response.status}`);
  return (await response.json()) as { version: number; draft: SetupDraft };
}
