import Link from "next/link";
import { listUnitsPage } from "@/db/queries/catalogue";
import { ActiveBadge, ItemActions } from "@/components/workshop/item-actions";
import { Pager } from "@/components/workshop/pager";
import { FactorText } from "@/components/workshop/unit-editor";
import { WorkshopNav } from "@/components/workshop/workshop-nav";
import { requirePageViewer } from "@/lib/auth/guard";
import { pageQuerySchema, WORKSHOP_PAGE_SIZE } from "@/lib/catalogue/schemas";
import { MAKER_ONLY } from "@/lib/domain";
import { formatQuantity } from "@/lib/units";
import { WorkshopTable } from "@/components/workshop/workshop-table";

export const metadata = { title: "Workshop: serial units" };

const cell = "border-t border-hairline px-3 py-2";

export default async function WorkshopUnitsPage({ searchParams }: PageProps<"/workshop/units">) {
  const viewer = await requirePageViewer(MAKER_ONLY, "/workshop/units");
  const { page } = pageQuerySchema.catch({ page: 1 }).parse(await searchParams);
  const list = await listUnitsPage({ page, pageSize: WORKSHOP_PAGE_SIZE });
  const units = viewer.unitSystem;
  return (
    <section className="space-y-4">
      <WorkshopNav
        current="units"
        title="Serial units"
        intro="Each sewn envelope with its weighed mass and its lift tests. The latest test's calibration factor scales the model's volume for every setup that names the unit."
      />
      <div className="flex justify-end">
        <Link href="/workshop/units/new" className="rounded bg-accent px-3 py-1.5 text-sm text-white" data-testid="new-unit">
          New unit
        </Link>
      </div>
      <WorkshopTable testId="workshop-units">
        <thead className="text-left text-muted">
          <tr>
            <th className="px-3 py-2">Serial</th>
            <th className="px-3 py-2">Model</th>
            <th className="px-3 py-2">Owner</th>
            <th className="px-3 py-2">Weighed mass</th>
            <th className="px-3 py-2">Latest lift test</th>
            <th className="px-3 py-2">Factor</th>
            <th className="px-3 py-2">Used by</th>
            <th className="px-3 py-2">State</th>
            <th className="px-3 py-2">
              <span className="sr-only">Actions</span>
            </th>
          </tr>
        </thead>
        <tbody>
          {list.rows.map((u) => (
            <tr key={u.id} data-testid="unit-row" data-unit-id={u.id}>
              <td className={`${cell} figure`}>
                <Link href={`/workshop/units/${u.id}`} className="text-accent-dark underline">
                  {u.serial}
                </Link>
              </td>
              <td className={cell}>{u.modelName}</td>
              <td className={cell}>{u.ownerName ?? <span className="text-muted">the workshop</span>}</td>
              <td className={`${cell} figure`}>{formatQuantity("mass", u.measuredMassKg, units)}</td>
              <td className={`${cell} figure`}>
                {u.latestTest ? `${formatQuantity("mass", u.latestTest.measuredGrossLiftKg, units)} on ${u.latestTest.testedOn}` : "none"}
              </td>
              <td className={cell}>
                <FactorText factor={u.calibrationFactor} />
              </td>
              <td className={`${cell} figure`}>{u.setupCount}</td>
              <td className={cell}>
                <ActiveBadge active={u.active} />
              </td>
              <td className={cell}>
                <ItemActions kind="units" id={u.id} name={u.serial} active={u.active} setupCount={u.setupCount} />
              </td>
            </tr>
          ))}
        </tbody>
      </WorkshopTable>
      <Pager basePath="/workshop/units" page={list.page} pageSize={list.pageSize} total={list.total} />
    </section>
  );
}
