import "server-only";
import { listSetupHistory, type HistoryEntry } from "@/db/queries/audit";
import * as reviewDb from "@/db/queries/review";
import type { Viewer } from "@/lib/auth/access";
import type { DecisionOutcome, ReviewReasonCode } from "@/lib/domain";
import { fail, ok, type Result } from "@/lib/errors";
import { kickMailDelivery } from "@/lib/mail/deliver";
import { commentAddedMail, decisionMail } from "@/lib/mail/templates";
import { appUrl } from "./app-url";

// The review desk: the queue, decisions, the thread and the history. Who may see a setup is
// decided in one query (getSetupHeaderForViewer): its owner, and review staff once it was submitted.

const NOT_FOUND = "No such setup, or not one you can see.";

async function visibleSetup(viewer: Viewer, id: string): Promise<Result<reviewDb.SetupHeader>> {
  const header = await reviewDb.getSetupHeaderForViewer({ id, viewer });
  return header ? ok(header) : fail("not_found", NOT_FOUND);
}

/** Where a person reads the setup: the owner in the Planner, staff on the review page. */
const setupPathFor = (recipientId: string, header: reviewDb.SetupHeader) =>
  recipientId === header.ownerId ? `/setups/${header.id}` : `/review/${header.id}`;

export async function listReviewQueue({
  filter,
}: {
  filter: reviewDb.QueueFilter;
}): Promise<Result<{ rows: reviewDb.QueueRow[]; total: number; page: number; pageSize: number }>> {
  const { rows, total } = await reviewDb.listQueue(filter);
  return ok({ rows, total, page: filter.page, pageSize: filter.pageSize });
}

export async function decideOnSetup({
  viewer,
  id,
  decision,
  reason,
  reasonCodes,
  version,
}: {
  viewer: Viewer;
  id: string;
  decision: DecisionOutcome;
  reason: string;
  reasonCodes: ReviewReasonCode[];
  version: number;
}): Promise<Result<{ id: string; status: string; version: number }>> {
  const outcome = await reviewDb.recordDecision({
    id,
    reviewer: viewer,
    version,
    decision,
    reason,
    reasonCodes,
    mail: (header) => [
      {
        kind: "setup-decision",
        to: header.ownerEmail,
        content: decisionMail({
          setupName: header.name,
          customerName: header.ownerName,
          modelName: header.modelName,
          worstFlag: header.worstFlag,
          freeLiftRatio: header.freeLiftRatio,
          payloadMassKg: header.payloadMassKg,
          url: appUrl(`/setups/${header.id}`),
          decision,
          reason,
          reviewerName: viewer.name,
        }),
      },
    ],
  });
  if (outcome.kind === "not_found") return fail("not_found", NOT_FOUND);
  if (outcome.kind === "refused") return fail(outcome.reason === "not_allowed" ? "forbidden" : "conflict", outcome.message);
  if (outcome.kind === "stale") {
    return fail(
      "conflict",
      `The customer saved this setup since you opened it (now version ${outcome.currentVersion}); reload it and review what changed.`,
    );
  }
  kickMailDelivery();
  return ok({ id, status: outcome.status, version });
}

export async function listComments({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<{ items: reviewDb.ThreadItem[] }>> {
  const header = await visibleSetup(viewer, id);
  if (!header.ok) return header;
  return ok({ items: await reviewDb.listThread({ setupId: id }) });
}

export async function addComment({ viewer, id, body }: { viewer: Viewer; id: string; body: string }): Promise<Result<{ id: string }>> {
  const header = await visibleSetup(viewer, id);
  if (!header.ok) return header;
  const commentId = await reviewDb.addComment({
    setupId: id,
    authorId: viewer.id,
    body,
    mail: (recipients) =>
      recipients.map((r) => ({
        kind: "setup-comment",
        to: r.email,
        content: commentAddedMail({
          setupName: header.data.name,
          authorName: viewer.name,
          body,
          url: appUrl(setupPathFor(r.id, header.data)),
        }),
      })),
  });
  kickMailDelivery();
  return ok({ id: commentId });
}

export async function markThreadRead({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<null>> {
  const header = await visibleSetup(viewer, id);
  if (!header.ok) return header;
  await reviewDb.markThreadRead({ setupId: id, userId: viewer.id });
  return ok(null);
}

export async function getSetupHistory({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<{ entries: HistoryEntry[] }>> {
  const header = await visibleSetup(viewer, id);
  if (!header.ok) return header;
  return ok({ entries: await listSetupHistory({ setupId: id }) });
}
