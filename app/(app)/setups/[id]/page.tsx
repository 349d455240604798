import Link from "next/link";
import { notFound } from "next/navigation";
import { catalogueIdsOfDraft, getPlannerCatalogue } from "@/db/queries/catalogue";
import { listThread } from "@/db/queries/review";
import { AttachmentsPanel } from "@/components/attachments/attachments-panel";
import { Planner } from "@/components/planner/planner";
import { toPlannerCatalogue } from "@/components/planner/to-planner-catalogue";
import { DecisionBanner } from "@/components/review/decision-banner";
import { Thread } from "@/components/review/thread";
import { requirePageViewer } from "@/lib/auth/guard";
import { listAttachments } from "@/lib/server/attachments";
import { getOwnSetup } from "@/lib/server/setups";

export const metadata = { title: "Planner" };

export default async function PlannerPage({ params }: PageProps<"/setups/[id]">) {
  const { id } = await params;
  const viewer = await requirePageViewer(undefined, `/setups/${id}`);
  const setup = await getOwnSetup({ viewer, id });
  if (!setup.ok) notFound();
  const [catalogueRows, thread, files] = await Promise.all([
    getPlannerCatalogue({ ownerId: viewer.id, includeIds: catalogueIdsOfDraft(setup.data.draft) }),
    listThread({ setupId: id }),
    listAttachments({ viewer, setupId: id }),
  ]);
  const { id: setupId, version, status, draft } = setup.data;
  const latestDecision = [...thread].reverse().find((item) => item.kind === "decision") ?? null;
  return (
    <div className="space-y-4">
      <p className="text-right text-sm">
        <Link href={`/setups/${setupId}/report`} className="text-accent underline" data-testid="open-report">
          Field report
        </Link>
      </p>
      <DecisionBanner decision={latestDecision} status={status} />
      <Planner data={{ setupId, version, status, draft, catalogue: toPlannerCatalogue(catalogueRows), unitSystem: viewer.unitSystem }} />
      <AttachmentsPanel setupId={setupId} initialAttachments={files.ok ? files.data.attachments : []} canEdit />
      {(status !== "draft" || thread.length > 0) && (
        <Thread
          setupId={id}
          viewerId={viewer.id}
          title="Discussion with support"
          initialItems={thread.map((t) => ({ ...t, at: t.at.toISOString() }))}
        />
      )}
    </div>
  );
}
