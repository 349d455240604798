import "server-only";
import { randomUUID } from "node:crypto";
import { and, asc, eq, inArray, lte, sql } from "drizzle-orm";
import { getDb, type Database } from "@/db";
import { mailOutbox, type MailOutboxRow } from "@/db/schema";
import type { MailContent } from "@/lib/mail/templates";

type Writer = Database | Parameters<Parameters<Database["transaction"]>[0]>[0];

export interface OutgoingMail {
  kind: string;
  to: string;
  content: MailContent;
}

/**
 * Puts messages in the outbox. Called with the transaction of the change they report, so a message
 * exists exactly when its change does; delivery happens after commit and is retried from the row.
 */
export async function enqueueMail(writer: Writer, messages: readonly OutgoingMail[]): Promise<void> {
  if (messages.length === 0) return;
  const now = new Date();
  await writer.insert(mailOutbox).values(
    messages.map((m) => ({
      id: randomUUID(),
      kind: m.kind,
      toAddress: m.to,
      subject: m.content.subject,
      textBody: m.content.text,
      htmlBody: m.content.html,
      nextAttemptAt: now,
    })),
  );
}

export async function enqueueMailNow(messages: readonly OutgoingMail[]): Promise<void> {
  await enqueueMail(getDb(), messages);
}

/**
 * Claims up to `limit` due pending rows for one delivery attempt, in one UPDATE statement so that
 * SQLite's write lock makes it atomic: a row is claimed by exactly one caller, whichever process.
 * The claim is a lease, not a status: it moves `nextAttemptAt` to `leaseUntil` (so the row is no
 * longer due) and counts the attempt; if the claimer dies mid-send the row falls due again after
 * the lease. The returned `attempts` is the claim's token for the mark functions below.
 */
export async function claimDueMail({
  now,
  leaseUntil,
  limit,
  db = getDb(),
}: {
  now: Date;
  leaseUntil: Date;
  limit: number;
  db?: Database;
}): Promise<MailOutboxRow[]> {
  const isDue = and(eq(mailOutbox.status, "pending"), lte(mailOutbox.nextAttemptAt, now));
  const due = db.select({ id: mailOutbox.id }).from(mailOutbox).where(isDue).orderBy(asc(mailOutbox.nextAttemptAt)).limit(limit);
  return db
    .update(mailOutbox)
    .set({ attempts: sql`${mailOutbox.attempts} + 1`, nextAttemptAt: leaseUntil })
    .where(and(inArray(mailOutbox.id, due), isDue))
    .returning();
}

// Only the holder of the current claim may settle a row: a row re-claimed after an expired lease
// has a higher attempt count, and a settled row is no longer pending.
const heldClaim = (id: string, attempts: number) =>
  and(eq(mailOutbox.id, id), eq(mailOutbox.status, "pending"), eq(mailOutbox.attempts, attempts));

/** Marks a claimed row sent. False when the claim was lost (then someone else settles it). */
export async function markMailSent({
  id,
  attempts,
  sentAt,
  db = getDb(),
}: {
  id: string;
  attempts: number;
  sentAt: Date;
  db?: Database;
}): Promise<boolean> {
  const rows = await db
    .update(mailOutbox)
    .set({ status: "sent", sentAt, lastError: null })
    .where(heldClaim(id, attempts))
    .returning({ id: mailOutbox.id });
  return rows.length > 0;
}

/**
 * Records a failed attempt on a claimed row: due again at `retryAt`, or `failed` for good when
 * `retryAt` is null. False when the claim was lost.
 */
export async function markMailAttemptFailed({
  id,
  attempts,
  error,
  retryAt,
  db = getDb(),
}: {
  id: string;
  attempts: number;
  error: string;
  retryAt: Date | null;
  db?: Database;
}): Promise<boolean> {
  const change = retryAt ? { nextAttemptAt: retryAt, lastError: error } : { status: "failed" as const, lastError: error };
  const rows = await db.update(mailOutbox).set(change).where(heldClaim(id, attempts)).returning({ id: mailOutbox.id });
  return rows.length > 0;
}
