import { EmptyState } from "@/components/ui/empty-state";
import { MAKER_ONLY } from "@/lib/domain";
import { requirePageViewer } from "@/lib/auth/guard";

export const metadata = { title: "Insight" };

export default async function InsightPage() {
  await requirePageViewer(MAKER_ONLY, "/insight");
  return (
    <section className="space-y-4">
      <h1 className="text-2xl">Insight</h1>
      <EmptyState title="Charts are not built yet">
        This page will chart what customers really fly, from saved setups: the spread of payload masses, payload
        categories, where mounts sit on the rail, and the reasons setups are sent back at review. No figures are shown
        until those charts read them from the database.
      </EmptyState>
    </section>
  );
}
