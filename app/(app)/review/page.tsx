import { listReviewQueue } from "@/db/queries/setups";
import { EmptyState } from "@/components/ui/empty-state";
import { SetupTable } from "@/components/ui/setup-table";
import { STAFF_ROLES } from "@/lib/domain";
import { requirePageViewer } from "@/lib/auth/guard";

export const metadata = { title: "Review desk" };

export default async function ReviewDeskPage() {
  await requirePageViewer(STAFF_ROLES, "/review");
  const queue = await listReviewQueue();
  return (
    <section className="space-y-4">
      <h1 className="text-2xl">Review desk</h1>
      <p className="text-sm text-muted">Setups customers have submitted for review before first flight, oldest first.</p>
      {queue.length === 0 ? (
        <EmptyState title="Nothing waiting">Submitted setups will queue here.</EmptyState>
      ) : (
        <SetupTable rows={queue} showOwner testId="review-queue" />
      )}
    </section>
  );
}
