import { listSimplePage } from "@/db/queries/catalogue";
import { Pager } from "@/components/workshop/pager";
import { SimpleCatalogue } from "@/components/workshop/simple-catalogue";
import { WorkshopNav } from "@/components/workshop/workshop-nav";
import { requirePageViewer } from "@/lib/auth/guard";
import { pageQuerySchema, WORKSHOP_PAGE_SIZE } from "@/lib/catalogue/schemas";
import { MAKER_ONLY } from "@/lib/domain";

export const metadata = { title: "Workshop: mounts" };

export default async function WorkshopMountsPage({ searchParams }: PageProps<"/workshop/mounts">) {
  const viewer = await requirePageViewer(MAKER_ONLY, "/workshop/mounts");
  const { page } = pageQuerySchema.catch({ page: 1 }).parse(await searchParams);
  const list = await listSimplePage({ kind: "mounts", page, pageSize: WORKSHOP_PAGE_SIZE });
  return (
    <section className="space-y-4">
      <WorkshopNav
        current="mounts"
        title="Mounts"
        intro="The sliding carriages on the belly rail: thread, mass, rated load and safety line."
      />
      <SimpleCatalogue kind="mounts" rows={list.rows} unitSystem={viewer.unitSystem} />
      <Pager basePath="/workshop/mounts" page={list.page} pageSize={list.pageSize} total={list.total} />
    </section>
  );
}
