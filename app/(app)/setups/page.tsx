import Link from "next/link";
import { listActiveEnvelopeModels } from "@/db/queries/catalogue";
import { countUnreadComments } from "@/db/queries/review";
import { listSetupsForOwner } from "@/db/queries/setups";
import { newSetupProblemFrom } from "@/components/setups/new-setup-address";
import { NewSetupForm } from "@/components/setups/new-setup-form";
import { SetupRowActions } from "@/components/setups/setup-row-actions";
import { SetupTable } from "@/components/setups/setup-table";
import { EmptyState } from "@/components/ui/empty-state";
import { Pager } from "@/components/ui/pager";
import { requirePageViewer } from "@/lib/auth/guard";

export const metadata = { title: "Setups" };

const PAGE_SIZE = 25;

export default async function SetupsPage({ searchParams }: PageProps<"/setups">) {
  const viewer = await requirePageViewer(undefined, "/setups");
  const query = await searchParams;
  const asked = Number(query.page);
  // Back from a refused no-JavaScript post: the problem, and what was typed so it need not be typed again.
  const problem = newSetupProblemFrom(query);
  const typed = (value: string | string[] | undefined) => (Array.isArray(value) ? value[0] : value) ?? "";
  const refused = problem ? { problem, name: typed(query.name), modelId: typed(query.modelId) } : null;
  const page = Number.isInteger(asked) && asked >= 1 && asked <= 1_000_000 ? asked : 1;
  const [{ rows, total }, models] = await Promise.all([
    listSetupsForOwner({ ownerId: viewer.id, page, pageSize: PAGE_SIZE }),
    listActiveEnvelopeModels(),
  ]);
  const unread = await countUnreadComments({ setupIds: rows.map((r) => r.id), userId: viewer.id });
  return (
    <section className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <h1 className="text-2xl">Setups</h1>
        <NewSetupForm models={models.map((m) => ({ id: m.id, name: m.name, gasVolumeM3: m.gasVolumeM3 }))} refused={refused} />
      </div>
      {total === 0 ? (
        <EmptyState title="No setups yet">
          A setup is one payload configuration on one envelope: the mount&apos;s place on the belly rail, the payloads, the site, the gas
          and the tether. Start one with “New setup”; it will be listed here with its status and worst flag.
        </EmptyState>
      ) : (
        <>
          <SetupTable
            rows={rows}
            hrefFor={(row) => `/setups/${row.id}`}
            actionsFor={(row) => <SetupRowActions id={row.id} name={row.name} />}
            unread={unread}
          />
          {rows.length === 0 && (
            <p className="text-sm text-muted">
              No setups on this page.{" "}
              <Link href="/setups" className="text-accent underline">
                Back to the first page
              </Link>
            </p>
          )}
          <Pager page={page} pageSize={PAGE_SIZE} total={total} hrefFor={(n) => `/setups?page=${n}`} label="Setup pages" />
        </>
      )}
    </section>
  );
}
