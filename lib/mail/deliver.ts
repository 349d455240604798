import "server-only";
import type { Database } from "@/db";
import { claimDueMail, markMailAttemptFailed, markMailSent } from "@/db/queries/mail";
import { createMailSender, type MailSender } from "./transport";

// The outbox's one consumer. Changes only insert rows (db/queries/mail.ts); this loop sends them
// after commit, so a slow or broken mail server never blocks or fails the change that queued them.

/** After this many attempts a message is `failed` for good (and logged). Common practice. */
export const MAIL_MAX_ATTEMPTS = 8;
/** First retry after 30 s, doubling each time (30 s, 1 min, 2 min … 32 min): about an hour in all. */
export const MAIL_RETRY_BASE_MS = 30_000;
export const MAIL_RETRY_MAX_MS = 60 * 60_000;
/** How long a claim holds a row; longer than the transport's worst-case wait (lib/mail/transport.ts). */
export const MAIL_CLAIM_LEASE_MS = 2 * 60_000;
export const MAIL_POLL_MS = 3_000;
const BATCH_SIZE = 10;
const MAX_BATCHES_PER_RUN = 20;

/** Delay before the next try after `attempts` failed ones: exponential backoff, capped. */
export function retryDelayMs(attempts: number): number {
  return Math.min(MAIL_RETRY_BASE_MS * 2 ** Math.max(0, attempts - 1), MAIL_RETRY_MAX_MS);
}

export interface DeliveryTally {
  sent: number;
  retrying: number;
  failed: number;
}

const describeError = (error: unknown): string => (error instanceof Error ? error.message : String(error)).slice(0, 500);

/**
 * Sends every message that is due now, one claimed batch after another, and settles each row:
 * `sent`, due again later with `lastError`, or `failed` after MAIL_MAX_ATTEMPTS.
 */
export async function deliverDueMail({
  send,
  clock = () => new Date(),
  db,
}: {
  send: MailSender;
  clock?: () => Date;
  db?: Database;
}): Promise<DeliveryTally> {
  const tally: DeliveryTally = { sent: 0, retrying: 0, failed: 0 };
  for (let batch = 0; batch < MAX_BATCHES_PER_RUN; batch += 1) {
    const now = clock();
    const rows = await claimDueMail({ now, leaseUntil: new Date(now.getTime() + MAIL_CLAIM_LEASE_MS), limit: BATCH_SIZE, db });
    for (const row of rows) {
      let failure: string | null = null;
      try {
        await send({ to: row.toAddress, subject: row.subject, text: row.textBody, html: row.htmlBody });
      } catch (error) {
        failure = describeError(error);
      }
      // Settled outside the try: a database error after a good send must not count as a failed
      // send (the row would be sent again); it ends the run and the lease brings the row back.
      if (failure === null) {
        await markMailSent({ id: row.id, attempts: row.attempts, sentAt: clock(), db });
        tally.sent += 1;
        continue;
      }
      const giveUp = row.attempts >= MAIL_MAX_ATTEMPTS;
      const retryAt = giveUp ? null : new Date(clock().getTime() + retryDelayMs(row.attempts));
      await markMailAttemptFailed({ id: row.id, attempts: row.attempts, error: failure, retryAt, db });
      if (giveUp) {
        tally.failed += 1;
        console.error(`[mail] gave up on ${row.kind} ${row.id} to ${row.toAddress} after ${row.attempts} attempts: ${failure}`);
      } else {
        tally.retrying += 1;
        console.warn(
          `[mail] ${row.kind} ${row.id} to ${row.toAddress} failed (attempt ${row.attempts} of ${MAIL_MAX_ATTEMPTS}), next try ${retryAt?.toISOString()}: ${failure}`,
        );
      }
    }
    if (rows.length < BATCH_SIZE) break;
  }
  return tally;
}

interface DeliveryLoop {
  timer: ReturnType<typeof setInterval>;
  send: MailSender;
  running: Promise<void> | null;
  again: boolean;
}

// On globalThis: Next may load this module once per bundle (instrumentation, each route), and
// all of them must share the one loop of the process.
const state = globalThis as unknown as { trimrailMailLoop?: DeliveryLoop; trimrailMailOff?: boolean };

function runLoop(loop: DeliveryLoop): void {
  if (loop.running) {
    loop.again = true; // a kick during a run: go round once more when it ends
    return;
  }
  loop.running = deliverDueMail({ send: loop.send })
    .then(() => undefined)
    // e.g. the database was busy; rows stay pending and the next tick tries again.
    .catch((error: unknown) => console.error("[mail] delivery run failed:", error))
    .finally(() => {
      loop.running = null;
      if (loop.again) {
        loop.again = false;
        runLoop(loop);
      }
    });
}

/**
 * Starts the process's delivery loop (once; later calls are no-ops): a run now, then every
 * `intervalMs`. Returns false when no mail route is configured; then messages wait in the outbox.
 */
export function startMailDelivery({ intervalMs = MAIL_POLL_MS }: { intervalMs?: number } = {}): boolean {
  if (state.trimrailMailLoop) return true;
  if (state.trimrailMailOff) return false;
  const send = createMailSender();
  if (!send) {
    state.trimrailMailOff = true;
    console.warn("[mail] neither SMTP_URL nor TRIMRAIL_SMTP_FAKE_PORT is set: messages wait in the outbox");
    return false;
  }
  const loop: DeliveryLoop = { timer: setInterval(() => runLoop(loop), intervalMs), send, running: null, again: false };
  loop.timer.unref(); // never keeps a process alive on its own
  state.trimrailMailLoop = loop;
  runLoop(loop);
  return true;
}

/** Delivers promptly after a commit that queued mail. Returns at once and never throws. */
export function kickMailDelivery(): void {
  try {
    const loop = state.trimrailMailLoop;
    if (loop) runLoop(loop);
    else startMailDelivery();
  } catch (error) {
    console.error("[mail] could not start delivery:", error);
  }
}

/** Stops the loop after its current run (tests, shutdown). */
export async function stopMailDelivery(): Promise<void> {
  const loop = state.trimrailMailLoop;
  if (!loop) return;
  clearInterval(loop.timer);
  loop.again = false;
  await loop.running;
  delete state.trimrailMailLoop;
}
