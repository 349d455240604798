import { listSimplePage } from "@/db/queries/catalogue";
import { Pager } from "@/components/workshop/pager";
import { SimpleCatalogue } from "@/components/workshop/simple-catalogue";
import { WorkshopNav } from "@/components/workshop/workshop-nav";
import { requirePageViewer } from "@/lib/auth/guard";
import { pageQuerySchema, WORKSHOP_PAGE_SIZE } from "@/lib/catalogue/schemas";
import { MAKER_ONLY } from "@/lib/domain";

export const metadata = { title: "Workshop: adapters" };

export default async function WorkshopAdaptersPage({ searchParams }: PageProps<"/workshop/adapters">) {
  const viewer = await requirePageViewer(MAKER_ONLY, "/workshop/adapters");
  const { page } = pageQuerySchema.catch({ page: 1 }).parse(await searchParams);
  const list = await listSimplePage({ kind: "adapters", page, pageSize: WORKSHOP_PAGE_SIZE });
  return (
    <section className="space-y-4">
      <WorkshopNav current="adapters" title="Adapters" intro="Thread adapters and strap plates between a payload and the mount's screw." />
      <SimpleCatalogue kind="adapters" rows={list.rows} unitSystem={viewer.unitSystem} />
      <Pager basePath="/workshop/adapters" page={list.page} pageSize={list.pageSize} total={list.total} />
    </section>
  );
}
