import Link from "next/link";
import { notFound } from "next/navigation";
import { listSetupHistory } from "@/db/queries/audit";
import { catalogueIdsOfDraft, getPlannerCatalogue } from "@/db/queries/catalogue";
import { getSetupHeaderForViewer, listThread } from "@/db/queries/review";
import { AttachmentsPanel } from "@/components/attachments/attachments-panel";
import { toPlannerCatalogue } from "@/components/planner/to-planner-catalogue";
import { DecisionForm } from "@/components/review/decision-form";
import { HistoryList } from "@/components/review/history-list";
import { ReviewWorkspace } from "@/components/review/review-workspace";
import { Thread } from "@/components/review/thread";
import { FlagBadge } from "@/components/ui/flag-badge";
import { STAFF_ROLES, STATUS_WORDS } from "@/lib/domain";
import { flagMessage } from "@/lib/flag-messages";
import { requirePageViewer } from "@/lib/auth/guard";
import { listAttachments } from "@/lib/server/attachments";
import { isCurrentResultShape } from "@/lib/server/evaluate-draft";
import { getSetup } from "@/lib/server/setups";

export const metadata = { title: "Review" };

export default async function ReviewPage({ params }: PageProps<"/review/[id]">) {
  const { id } = await params;
  const viewer = await requirePageViewer(STAFF_ROLES, `/review/${id}`);
  const [setup, header] = await Promise.all([getSetup({ viewer, id }), getSetupHeaderForViewer({ id, viewer })]);
  if (!setup.ok || !header) notFound();
  const [catalogueRows, thread, history, files] = await Promise.all([
    getPlannerCatalogue({ ownerId: header.ownerId, includeIds: catalogueIdsOfDraft(setup.data.draft) }),
    listThread({ setupId: id }),
    listSetupHistory({ setupId: id }),
    listAttachments({ viewer, setupId: id }),
  ]);
  const { version, status, draft, result } = setup.data;
  const raised = (result?.flags ?? []).filter((f) => f.level !== "ok");
  const canDecide = status === "submitted" && header.ownerId !== viewer.id;

  return (
    <div className="space-y-4" data-testid="review-page">
      <p className="flex justify-between text-sm">
        <Link href="/review" className="text-accent underline">
          ← Review desk
        </Link>
        <Link href={`/setups/${id}/report`} className="text-accent underline">
          Field report
        </Link>
      </p>
      <header className="flex flex-wrap items-baseline gap-x-4 gap-y-1">
        <h1 className="text-2xl" data-testid="review-title">
          {draft.name}
        </h1>
        <span className="text-sm text-muted">
          by {header.ownerName} · {header.modelName} · version {version}
        </span>
        <span className="rounded bg-white px-2 py-0.5 text-sm" data-testid="review-status">
          {STATUS_WORDS[status]}
        </span>
        {header.worstFlag && <FlagBadge level={header.worstFlag} />}
      </header>
      <p className="text-sm text-muted">
        Read-only: only the customer can change this setup. The figures are the server&apos;s stored evaluation of version {version}.
      </p>
      <ReviewWorkspace
        data={{
          setupId: id,
          version,
          status,
          draft,
          catalogue: toPlannerCatalogue(catalogueRows),
          unitSystem: viewer.unitSystem,
          storedResult: isCurrentResultShape(result) ? result : null,
        }}
      >
        {canDecide ? (
          <DecisionForm
            setupId={id}
            version={version}
            raised={[
              ...new Map(raised.map((f) => [f.code, { code: f.code, level: f.level, text: flagMessage(f, viewer.unitSystem) }])).values(),
            ]}
          />
        ) : (
          <p className="panel p-4 text-sm" data-testid="decision-closed">
            {header.ownerId === viewer.id
              ? "This is your own setup: someone else reviews it."
              : `No decision is open: the setup is ${STATUS_WORDS[status]}.`}
          </p>
        )}
        <AttachmentsPanel
          setupId={id}
          initialAttachments={files.ok ? files.data.attachments : []}
          title="Customer's photos and datasheets"
        />
        <Thread setupId={id} viewerId={viewer.id} initialItems={thread.map((t) => ({ ...t, at: t.at.toISOString() }))} />
        <HistoryList entries={history} />
      </ReviewWorkspace>
    </div>
  );
}
