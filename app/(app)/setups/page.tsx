import { listActiveEnvelopeModels } from "@/db/queries/catalogue";
import { countUnreadComments } from "@/db/queries/review";
import { listSetupsForOwner } from "@/db/queries/setups";
import { NewSetupForm } from "@/components/setups/new-setup-form";
import { SetupRowActions } from "@/components/setups/setup-row-actions";
import { EmptyState } from "@/components/ui/empty-state";
import { SetupTable } from "@/components/ui/setup-table";
import { requirePageViewer } from "@/lib/auth/guard";

export const metadata = { title: "Setups" };

export default async function SetupsPage() {
  const viewer = await requirePageViewer(undefined, "/setups");
  const [rows, models] = await Promise.all([listSetupsForOwner({ ownerId: viewer.id }), listActiveEnvelopeModels()]);
  const unread = await countUnreadComments({ setupIds: rows.map((r) => r.id), userId: viewer.id });
  return (
    <section className="space-y-4">
      <div className="flex flex-wrap items-end justify-between gap-4">
        <h1 className="text-2xl">Setups</h1>
        <NewSetupForm models={models.map((m) => ({ id: m.id, name: m.name, gasVolumeM3: m.gasVolumeM3 }))} />
      </div>
      {rows.length === 0 ? (
        <EmptyState title="No setups yet">
          A setup is one payload configuration on one envelope: the mount&apos;s place on the belly rail, the payloads, the
          site, the gas and the tether. Start one with “New setup”; it will be listed here with its status and worst flag.
        </EmptyState>
      ) : (
        <SetupTable rows={rows} hrefFor={(row) => `/setups/${row.id}`} actionsFor={(row) => <SetupRowActions id={row.id} name={row.name} />} unread={unread} />
      )}
    </section>
  );
}
