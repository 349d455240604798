import { listSimplePage } from "@/db/queries/catalogue";
import { Pager } from "@/components/workshop/pager";
import { SimpleCatalogue } from "@/components/workshop/simple-catalogue";
import { TemplatesCsv } from "@/components/workshop/templates-csv";
import { WorkshopNav } from "@/components/workshop/workshop-nav";
import { requirePageViewer } from "@/lib/auth/guard";
import { pageQuerySchema, WORKSHOP_PAGE_SIZE } from "@/lib/catalogue/schemas";
import { MAKER_ONLY } from "@/lib/domain";

export const metadata = { title: "Workshop: payload templates" };

export default async function WorkshopTemplatesPage({ searchParams }: PageProps<"/workshop/templates">) {
  const viewer = await requirePageViewer(MAKER_ONLY, "/workshop/templates");
  const { page } = pageQuerySchema.catch({ page: 1 }).parse(await searchParams);
  const list = await listSimplePage({ kind: "templates", page, pageSize: WORKSHOP_PAGE_SIZE });
  return (
    <section className="space-y-4">
      <WorkshopNav current="templates" title="Payload templates" intro="What customers pick from when they add a payload." />
      <TemplatesCsv />
      <SimpleCatalogue kind="templates" rows={list.rows} unitSystem={viewer.unitSystem} />
      <Pager basePath="/workshop/templates" page={list.page} pageSize={list.pageSize} total={list.total} />
    </section>
  );
}
