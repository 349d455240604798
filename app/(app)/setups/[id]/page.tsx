import { notFound } from "next/navigation";
import { getPlannerCatalogue } from "@/db/queries/catalogue";
import { Planner } from "@/components/planner/planner";
import { toPlannerCatalogue } from "@/components/planner/to-planner-catalogue";
import { requirePageViewer } from "@/lib/auth/guard";
import { getOwnSetup } from "@/lib/server/setups";

export const metadata = { title: "Planner" };

export default async function PlannerPage({ params }: PageProps<"/setups/[id]">) {
  const { id } = await params;
  const viewer = await requirePageViewer(undefined, `/setups/${id}`);
  const setup = await getOwnSetup({ viewer, id });
  if (!setup.ok) notFound();
  const catalogue = toPlannerCatalogue(await getPlannerCatalogue({ ownerId: viewer.id }));
  const { id: setupId, version, status, draft } = setup.data;
  return <Planner data={{ setupId, version, status, draft, catalogue, unitSystem: viewer.unitSystem }} />;
}
