import { notFound } from "next/navigation";
import { getPlannerCatalogue, getSetupById } from "@/db/queries/planner";
import { Planner } from "@/components/planner/planner";
import type { PlannerCatalogue } from "@/components/planner/types";
import { requirePageViewer } from "@/lib/auth/guard";

export const metadata = { title: "Planner" };

export default async function PlannerPage({ params }: PageProps<"/setups/[id]">) {
  const { id } = await params;
  const viewer = await requirePageViewer(undefined, `/setups/${id}`);
  const setup = await getSetupById({ id, ownerId: viewer.id });
  if (!setup) notFound();
  const rows = await getPlannerCatalogue({ ownerId: viewer.id });
  const catalogue: PlannerCatalogue = {
    models: rows.models.map((m) => ({
      id: m.id, name: m.name, slug: m.slug, glbPath: m.glbPath, railTabCount: m.railTabCount,
      gasVolumeM3: m.gasVolumeM3, nominalMassKg: m.nominalMassKg,
      buoyancyCentreXM: m.buoyancyCentreXM, buoyancyCentreZM: m.buoyancyCentreZM,
      massCentreXM: m.massCentreXM, massCentreZM: m.massCentreZM,
      tetherPointXM: m.tetherPointXM, tetherPointZM: m.tetherPointZM,
      railStartXM: m.railStartXM, railEndXM: m.railEndXM, railZM: m.railZM,
      hullJson: m.hullJson, aeroJson: m.aeroJson, limitsJson: m.limitsJson,
    })),
    units: rows.units.map((u) => ({ id: u.id, modelId: u.modelId, serial: u.serial, measuredMassKg: u.measuredMassKg, measuredGrossLiftKg: u.measuredGrossLiftKg })),
    mounts: rows.mounts.map((m) => ({ id: m.id, name: m.name, thread: m.thread, massKg: m.massKg, ratedLoadKg: m.ratedLoadKg, safetyLineBreakingLoadN: m.safetyLineBreakingLoadN })),
    adapters: rows.adapters.map((a) => ({ id: a.id, name: a.name, fromThread: a.fromThread, toThread: a.toThread, massKg: a.massKg })),
    templates: rows.templates.map((t) => ({
      id: t.id, name: t.name, description: t.description, category: t.category, massKg: t.massKg, shape: t.shape,
      lengthM: t.lengthM, widthM: t.widthM, heightM: t.heightM, attachment: t.attachment, dragAreaM2: t.dragAreaM2,
      offsetXM: t.offsetXM, offsetZM: t.offsetZM,
    })),
  };
  return (
    <Planner
      data={{ setupId: setup.row.id, version: setup.row.version, status: setup.row.status, draft: setup.draft, catalogue, unitSystem: viewer.unitSystem }}
    />
  );
}
