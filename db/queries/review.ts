import "server-only";
import { and, asc, count, desc, eq, inArray, isNotNull, or, sql, type SQL } from "drizzle-orm";
import { randomUUID } from "node:crypto";
import { getDb } from "@/db";
import { comments, decisions, envelopeModels, setupReads, setupSearchKeys, setups, user } from "@/db/schema";
import { SEARCH_MIN_CHARS, SETUP_NAME_SEARCH } from "@/db/setup-search-sql";
import type { DecisionOutcome, FlagLevel, QueueSort, ReviewReasonCode, Role, SetupStatus } from "@/lib/domain";
import { nextStatus } from "@/lib/domain";
import { recordAudit } from "./audit";
import { enqueueMail, type OutgoingMail } from "./mail";

// ---------------------------------------------------------------- who may see a setup

export interface SetupHeader {
  id: string;
  name: string;
  status: SetupStatus;
  version: number;
  ownerId: string;
  ownerName: string;
  ownerEmail: string;
  modelName: string;
  payloadMassKg: number;
  freeLiftRatio: number | null;
  worstFlag: FlagLevel | null;
  submittedAt: Date | null;
}

const headerColumns = {
  id: setups.id,
  name: setups.name,
  status: setups.status,
  version: setups.version,
  ownerId: setups.ownerId,
  ownerName: user.name,
  ownerEmail: user.email,
  modelName: envelopeModels.name,
  payloadMassKg: setups.payloadMassKg,
  freeLiftRatio: setups.freeLiftRatio,
  worstFlag: setups.worstFlag,
  submittedAt: setups.submittedAt,
};

/**
 * A setup's header as this viewer may see it, or null: the owner always; review staff once it has
 * been submitted (a customer's unsubmitted drafts stay theirs).
 */
export async function getSetupHeaderForViewer({
  id,
  viewer,
}: {
  id: string;
  viewer: { id: string; role: Role };
}): Promise<SetupHeader | null> {
  const staff = viewer.role === "support" || viewer.role === "maker";
  const [row] = await getDb()
    .select(headerColumns)
    .from(setups)
    .innerJoin(user, eq(setups.ownerId, user.id))
    .innerJoin(envelopeModels, eq(setups.modelId, envelopeModels.id))
    .where(
      and(eq(setups.id, id), staff ? or(eq(setups.ownerId, viewer.id), isNotNull(setups.submittedAt)) : eq(setups.ownerId, viewer.id)),
    );
  return row ?? null;
}

// ---------------------------------------------------------------- the queue

export interface QueueFilter {
  /** null: every setup that has been submitted at some time. */
  status: SetupStatus | null;
  worst: FlagLevel | null;
  modelId: string | null;
  q: string | null;
  sort: QueueSort;
  dir: "asc" | "desc";
  page: number;
  pageSize: number;
}

export interface QueueRow extends Omit<SetupHeader, "ownerId" | "ownerEmail" | "version"> {
  modelId: string;
}

/** `%` and `_` typed by a person are letters, not wildcards. */
const containing = (text: string) => `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;

/**
 * The setups that can match a search of three characters or more, from indexes: names through the
 * trigram index (setup_name_search), owners through their names. The LIKE above still decides each
 * row, so this only spares reading the others; null for a shorter search, which reads them all.
 * Two arms of an OR rather than one UNION: SQLite then walks each index on its own (a multi-index
 * OR) instead of building the whole candidate set in a temporary B-tree first.
 */
function searchCandidates(q: string, pattern: string): SQL | null {
  if ([...q].length < SEARCH_MIN_CHARS) return null;
  const phrase = `"${q.replace(/"/g, '""')}"`;
  const byName = sql`(select k.setup_id from ${sql.raw(SETUP_NAME_SEARCH)} f join ${setupSearchKeys} k on k.key = f.rowid where ${sql.raw(SETUP_NAME_SEARCH)} match ${phrase})`;
  const byOwner = sql`(select ${user.id} from ${user} where ${user.name} like ${pattern} escape '\\')`;
  return or(inArray(setups.id, byName), inArray(setups.ownerId, byOwner)) as SQL;
}

export async function listQueue(filter: QueueFilter): Promise<{ rows: QueueRow[]; total: number }> {
  const conditions: SQL[] = [filter.status ? eq(setups.status, filter.status) : isNotNull(setups.submittedAt)];
  if (filter.worst) conditions.push(eq(setups.worstFlag, filter.worst));
  if (filter.modelId) conditions.push(eq(setups.modelId, filter.modelId));
  if (filter.q) {
    const pattern = containing(filter.q);
    conditions.push(or(sql`${setups.name} like ${pattern} escape '\\'`, sql`${user.name} like ${pattern} escape '\\'`) as SQL);
    const candidates = searchCandidates(filter.q, pattern);
    if (candidates) conditions.push(candidates);
  }
  const where = and(...conditions);
  // "waiting" longest first is submittedAt oldest first: one index serves both.
  const column = {
    submittedAt: setups.submittedAt,
    waiting: setups.submittedAt,
    freeLiftRatio: setups.freeLiftRatio,
    payloadMassKg: setups.payloadMassKg,
  }[filter.sort];
  const ascending = filter.sort === "waiting" ? filter.dir === "desc" : filter.dir === "asc";
  const db = getDb();
  const page = (withTotal: boolean) =>
    db
      .select({ ...headerColumns, modelId: setups.modelId, ...(withTotal ? { total: sql<number>`count(*) over ()` } : {}) })
      .from(setups)
      .innerJoin(user, eq(setups.ownerId, user.id))
      .innerJoin(envelopeModels, eq(setups.modelId, envelopeModels.id))
      .where(where)
      .orderBy(ascending ? asc(column) : desc(column), ascending ? asc(setups.id) : desc(setups.id))
      .limit(filter.pageSize)
      .offset((filter.page - 1) * filter.pageSize);
  const countAll = () =>
    filter.q
      ? db.select({ total: count() }).from(setups).innerJoin(user, eq(setups.ownerId, user.id)).where(where)
      : db.select({ total: count() }).from(setups).where(where);
  const strip = ({ ownerId: _o, ownerEmail: _e, version: _v, total: _t, ...row }: SetupHeader & { modelId: string; total?: number }) => row;
  if (filter.q) {
    // A search reads every match to order them, so it counts them in the same pass (a window
    // function) instead of reading them all a second time; a page past the end has no row to
    // carry the count, and asks for it alone.
    const rows = await page(true);
    const total = rows[0]?.total ?? (filter.page > 1 ? (await countAll())[0].total : 0);
    return { rows: rows.map(strip), total };
  }
  // Without a search, the order's index serves the page and a covering index the count.
  const [rows, [{ total }]] = await Promise.all([page(false), countAll()]);
  return { rows: rows.map(strip), total };
}

// ---------------------------------------------------------------- decisions

export type DecisionOutcomeResult =
  | { kind: "decided"; status: SetupStatus }
  | { kind: "not_found" }
  | { kind: "stale"; currentVersion: number }
  | { kind: "refused"; message: string; reason: "not_allowed" | "wrong_status" };

export async function recordDecision({
  id,
  reviewer,
  version,
  decision,
  reason,
  reasonCodes,
  mail,
}: {
  id: string;
  reviewer: { id: string; role: Role };
  version: number;
  decision: DecisionOutcome;
  reason: string;
  reasonCodes: ReviewReasonCode[];
  mail: (header: SetupHeader) => OutgoingMail[];
}): Promise<DecisionOutcomeResult> {
  return getDb().transaction(async (tx) => {
    const [header] = await tx
      .select(headerColumns)
      .from(setups)
      .innerJoin(user, eq(setups.ownerId, user.id))
      .innerJoin(envelopeModels, eq(setups.modelId, envelopeModels.id))
      .where(and(eq(setups.id, id), isNotNull(setups.submittedAt)));
    if (!header) return { kind: "not_found" };
    const verdict = nextStatus({
      action: decision === "approved" ? "approve" : "request_changes",
      from: header.status,
      isOwner: header.ownerId === reviewer.id,
      role: reviewer.role,
    });
    if (!verdict.ok) return { kind: "refused", message: verdict.message, reason: verdict.reason };
    if (header.version !== version) return { kind: "stale", currentVersion: header.version };
    await tx
      .update(setups)
      .set({ status: verdict.to })
      .where(and(eq(setups.id, id), eq(setups.version, version)));
    await tx.insert(decisions).values({
      id: randomUUID(),
      setupId: id,
      reviewerId: reviewer.id,
      outcome: decision,
      setupVersion: version,
      reasonsJson: reasonCodes,
      note: reason,
    });
    await recordAudit(tx, {
      actorId: reviewer.id,
      action: "setup.decision",
      entityType: "setup",
      entityId: id,
      detail: { version, from: header.status, to: verdict.to, decision, reason },
    });
    await enqueueMail(tx, mail({ ...header, status: verdict.to }));
    return { kind: "decided", status: verdict.to };
  });
}

// ---------------------------------------------------------------- the thread

export interface ThreadItem {
  kind: "comment" | "decision";
  id: string;
  at: Date;
  authorId: string;
  authorName: string;
  authorRole: Role;
  body: string;
  decision: DecisionOutcome | null;
  setupVersion: number | null;
}

/** Comments and decisions of a setup in the order they were made. */
export async function listThread({ setupId }: { setupId: string }): Promise<ThreadItem[]> {
  const db = getDb();
  const [commentRows, decisionRows] = await Promise.all([
    db
      .select({
        id: comments.id,
        at: comments.createdAt,
        authorId: comments.authorId,
        authorName: user.name,
        authorRole: user.role,
        body: comments.body,
      })
      .from(comments)
      .innerJoin(user, eq(comments.authorId, user.id))
      .where(eq(comments.setupId, setupId)),
    db
      .select({
        id: decisions.id,
        at: decisions.createdAt,
        authorId: decisions.reviewerId,
        authorName: user.name,
        authorRole: user.role,
        body: decisions.note,
        decision: decisions.outcome,
        setupVersion: decisions.setupVersion,
      })
      .from(decisions)
      .innerJoin(user, eq(decisions.reviewerId, user.id))
      .where(eq(decisions.setupId, setupId)),
  ]);
  return [
    ...commentRows.map((c) => ({ ...c, kind: "comment" as const, decision: null, setupVersion: null })),
    ...decisionRows.map((d) => ({ ...d, kind: "decision" as const })),
  ].sort((a, b) => a.at.getTime() - b.at.getTime() || a.id.localeCompare(b.id));
}

/** Adds a comment and the mail it causes, in one transaction; returns the new comment's id. */
export async function addComment({
  setupId,
  authorId,
  body,
  mail,
}: {
  setupId: string;
  authorId: string;
  body: string;
  mail: (participants: { id: string; email: string; role: Role }[]) => OutgoingMail[];
}): Promise<string> {
  return getDb().transaction(async (tx) => {
    const id = randomUUID();
    await tx.insert(comments).values({ id, setupId, authorId, body });
    await tx
      .insert(setupReads)
      .values({ setupId, userId: authorId, lastReadAt: new Date() })
      .onConflictDoUpdate({ target: [setupReads.setupId, setupReads.userId], set: { lastReadAt: new Date() } });
    // Everyone who has spoken in the thread or decided on it, and the owner.
    const participants = await tx.all<{ id: string; email: string; role: Role }>(sql`
      select distinct u.id as id, u.email as email, u.role as role from user u
      where u.id = (select owner_id from setups where id = ${setupId})
         or u.id in (select author_id from comments where setup_id = ${setupId})
         or u.id in (select reviewer_id from decisions where setup_id = ${setupId})`);
    await enqueueMail(tx, mail(participants.filter((p) => p.id !== authorId)));
    return id;
  });
}

export async function markThreadRead({ setupId, userId }: { setupId: string; userId: string }): Promise<void> {
  const now = new Date();
  await getDb()
    .insert(setupReads)
    .values({ setupId, userId, lastReadAt: now })
    .onConflictDoUpdate({ target: [setupReads.setupId, setupReads.userId], set: { lastReadAt: now } });
}

/** Unread comments by others, per setup, among the given ones. */
export async function countUnreadComments({ setupIds, userId }: { setupIds: string[]; userId: string }): Promise<Record<string, number>> {
  if (setupIds.length === 0) return {};
  const rows = await getDb()
    .select({ setupId: comments.setupId, unread: count() })
    .from(comments)
    .leftJoin(setupReads, and(eq(setupReads.setupId, comments.setupId), eq(setupReads.userId, userId)))
    .where(
      and(
        inArray(comments.setupId, setupIds),
        sql`${comments.authorId} <> ${userId}`,
        or(sql`${setupReads.lastReadAt} is null`, sql`${comments.createdAt} > ${setupReads.lastReadAt}`),
      ),
    )
    .groupBy(comments.setupId);
  return Object.fromEntries(rows.map((r) => [r.setupId, r.unread]));
}
