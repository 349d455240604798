import { Suspense } from "react";
import { listEnvelopeModels } from "@/db/queries/catalogue";
import { InsightView } from "@/components/insight/insight-view";
import { STAFF_ROLES } from "@/lib/domain";
import { requirePageViewer } from "@/lib/auth/guard";

export const metadata = { title: "Insight" };

export default async function InsightPage() {
  const viewer = await requirePageViewer(STAFF_ROLES, "/insight");
  const models = await listEnvelopeModels();
  return (
    <section className="space-y-4">
      <div className="flex flex-wrap items-baseline justify-between gap-3">
        <h1 className="text-2xl">Insight</h1>
        {viewer.role === "maker" && (
          <a href="/api/insight/setups.csv" className="text-sm text-accent underline" data-testid="export-setups" download>
            Export every setup as CSV
          </a>
        )}
      </div>
      <p className="text-sm text-muted">
        What customers plan and fly, counted from their saved setups: to size the next batch and the next envelope.
      </p>
      <Suspense
        fallback={
          <p role="status" className="text-sm text-muted">
            Loading…
          </p>
        }
      >
        <InsightView
          models={models.map((m) => ({ id: m.id, name: m.name, railStartXM: m.railStartXM, railEndXM: m.railEndXM }))}
          unitSystem={viewer.unitSystem}
        />
      </Suspense>
    </section>
  );
}
