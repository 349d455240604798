import { notFound } from "next/navigation";
import { getPlannerCatalogue, getSetupById } from "@/db/queries/planner";
import { Planner } from "@/components/planner/planner";
import { toPlannerCatalogue } from "@/components/planner/to-planner-catalogue";
import { requirePageViewer } from "@/lib/auth/guard";

export const metadata = { title: "Planner" };

export default async function PlannerPage({ params }: PageProps<"/setups/[id]">) {
  const { id } = await params;
  const viewer = await requirePageViewer(undefined, `/setups/${id}`);
  const setup = await getSetupById({ id, ownerId: viewer.id });
  if (!setup) notFound();
  const catalogue = toPlannerCatalogue(await getPlannerCatalogue({ ownerId: viewer.id }));
  return (
    <Planner
      data={{ setupId: setup.row.id, version: setup.row.version, status: setup.row.status, draft: setup.draft, catalogue, unitSystem: viewer.unitSystem }}
    />
  );
}
