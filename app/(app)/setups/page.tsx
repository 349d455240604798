import { listSetupsForOwner } from "@/db/queries/setups";
import { EmptyState } from "@/components/ui/empty-state";
import { SetupTable } from "@/components/ui/setup-table";
import { requirePageViewer } from "@/lib/auth/guard";

export const metadata = { title: "Setups" };

export default async function SetupsPage() {
  const viewer = await requirePageViewer(undefined, "/setups");
  const rows = await listSetupsForOwner({ ownerId: viewer.id });
  return (
    <section className="space-y-4">
      <h1 className="text-2xl">Setups</h1>
      {rows.length === 0 ? (
        <EmptyState title="No setups yet">
          A setup is one payload configuration on one envelope: the mount&apos;s place on the belly rail, the payloads, the
          site, the gas and the tether. Your setups will be listed here with their status and worst flag.
        </EmptyState>
      ) : (
        <SetupTable rows={rows} />
      )}
    </section>
  );
}
