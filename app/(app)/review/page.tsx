import { Suspense } from "react";
import { listEnvelopeModels } from "@/db/queries/catalogue";
import { ReviewQueue } from "@/components/review/review-queue";
import { STAFF_ROLES } from "@/lib/domain";
import { requirePageViewer } from "@/lib/auth/guard";

export const metadata = { title: "Review desk" };

export default async function ReviewDeskPage() {
  const viewer = await requirePageViewer(STAFF_ROLES, "/review");
  const models = await listEnvelopeModels();
  return (
    <section className="space-y-4">
      <h1 className="text-2xl">Review desk</h1>
      <p className="text-sm text-muted">
        Setups customers have submitted before a first flight. Open one to read its balance report, discuss it, and approve it or send it
        back.
      </p>
      <Suspense
        fallback={
          <p role="status" className="text-sm text-muted">
            Loading the queue…
          </p>
        }
      >
        <ReviewQueue models={models.map((m) => ({ id: m.id, name: m.name }))} unitSystem={viewer.unitSystem} />
      </Suspense>
    </section>
  );
}
