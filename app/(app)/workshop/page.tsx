import Link from "next/link";
import { listModelsPage } from "@/db/queries/catalogue";
import { ActiveBadge, ItemActions } from "@/components/workshop/item-actions";
import { Pager } from "@/components/workshop/pager";
import { WorkshopNav } from "@/components/workshop/workshop-nav";
import { requirePageViewer } from "@/lib/auth/guard";
import { pageQuerySchema, WORKSHOP_PAGE_SIZE } from "@/lib/catalogue/schemas";
import { MAKER_ONLY } from "@/lib/domain";
import { formatQuantity } from "@/lib/units";
import { WorkshopTable } from "@/components/workshop/workshop-table";

export const metadata = { title: "Workshop: envelope models" };

const cell = "border-t border-hairline px-3 py-2";

export default async function WorkshopModelsPage({ searchParams }: PageProps<"/workshop">) {
  const viewer = await requirePageViewer(MAKER_ONLY, "/workshop");
  const { page } = pageQuerySchema.catch({ page: 1 }).parse(await searchParams);
  const list = await listModelsPage({ page, pageSize: WORKSHOP_PAGE_SIZE });
  const units = viewer.unitSystem;
  return (
    <section className="space-y-4">
      <WorkshopNav
        current="models"
        title="Workshop"
        intro="The catalogue customers plan with. An item that setups use is retired rather than deleted, so those setups keep working."
      />
      <div className="flex items-center justify-between">
        <h2 className="text-lg">Envelope models</h2>
        <Link href="/workshop/models/new" className="rounded bg-accent px-3 py-1.5 text-sm text-white" data-testid="new-model">
          New model
        </Link>
      </div>
      <WorkshopTable testId="workshop-models">
        <thead className="text-left text-muted">
          <tr>
            <th className="px-3 py-2">Model</th>
            <th className="px-3 py-2">Gas volume</th>
            <th className="px-3 py-2">Mass</th>
            <th className="px-3 py-2">Rail</th>
            <th className="px-3 py-2">Used by</th>
            <th className="px-3 py-2">State</th>
            <th className="px-3 py-2">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {list.rows.map((m) => (
            <tr key={m.id} data-testid="model-row" data-model-id={m.id}>
              <td className={cell}>
                <Link href={`/workshop/models/${m.id}`} className="text-accent-dark underline">
                  {m.name}
                </Link>
              </td>
              <td className={`${cell} figure`}>{formatQuantity("volume", m.gasVolumeM3, units)}</td>
              <td className={`${cell} figure`}>{formatQuantity("mass", m.nominalMassKg, units)}</td>
              <td className={`${cell} figure`}>
                {formatQuantity("length", m.railStartXM, units)} – {formatQuantity("length", m.railEndXM, units)}
              </td>
              <td className={`${cell} figure`}>
                {m.setupCount} setup{m.setupCount === 1 ? "" : "s"}
              </td>
              <td className={cell}>
                <ActiveBadge active={m.active} />
              </td>
              <td className={cell}>
                <ItemActions kind="models" id={m.id} name={m.name} active={m.active} setupCount={m.setupCount} />
              </td>
            </tr>
          ))}
        </tbody>
      </WorkshopTable>
      <Pager basePath="/workshop" page={list.page} pageSize={list.pageSize} total={list.total} />
    </section>
  );
}
