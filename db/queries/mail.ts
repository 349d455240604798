import "server-only";
import { randomUUID } from "node:crypto";
import { getDb, type Database } from "@/db";
import { mailOutbox } from "@/db/schema";
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
    messages.map((m) => ({ id: randomUUID(), kind: m.kind, toAddress: m.to, subject: m.content.subject, textBody: m.content.text, htmlBody: m.content.html, nextAttemptAt: now })),
  );
}

export async function enqueueMailNow(messages: readonly OutgoingMail[]): Promise<void> {
  await enqueueMail(getDb(), messages);
}
