import { mkdtempSync, readdirSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import os from "node:os";
import path from "node:path";
import { eq } from "drizzle-orm";
import { afterAll, afterEach, beforeAll, beforeEach, describe, expect, it, vi } from "vitest";
import { openDatabase, type Database } from "@/db/index";
import { migrateDatabase } from "@/db/migrate";
import { claimDueMail, enqueueMail } from "@/db/queries/mail";
import { mailOutbox } from "@/db/schema";
import { capturedMailId } from "@/lib/mail/captured-file";
import { deliverDueMail, MAIL_CLAIM_LEASE_MS, MAIL_MAX_ATTEMPTS, MAIL_RETRY_BASE_MS, retryDelayMs } from "@/lib/mail/deliver";
import { passwordResetMail } from "@/lib/mail/templates";
import { createMailSender, type MailSender } from "@/lib/mail/transport";
import { startSmtpFake, type SmtpFake } from "../../../scripts/smtp-fake";

// The outbox against a real SQLite file and real SMTP on loopback: a refused connection is the
// failing transport, the fake is the working one.

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-outbox-"));
const mailDir = path.join(dir, "mail");
const databaseUrl = `file:${path.join(dir, "outbox.db")}`;
let db: Database;
let closeDb: () => void;
let fake: SmtpFake;
let working: MailSender;
let refused: MailSender;

/** A port that nothing listens on: connecting to it is refused at once. */
async function closedPort(): Promise<number> {
  return new Promise((resolve) => {
    const server = createServer().listen(0, "127.0.0.1", () => {
      const address = server.address();
      server.close(() => resolve(typeof address === "object" && address ? address.port : 1));
    });
  });
}

const keptFiles = () => readdirSync(mailDir).filter((f) => capturedMailId(f));
const message = (to: string) => ({
  kind: "password-reset",
  to,
  content: passwordResetMail({ name: "Wren", url: `http://localhost:3000/r/${to}` }),
});
const rowsFor = (to: string) => db.select().from(mailOutbox).where(eq(mailOutbox.toAddress, to));

beforeAll(async () => {
  const opened = openDatabase(databaseUrl);
  db = opened.db;
  closeDb = () => opened.client.close();
  await migrateDatabase(db);
  fake = await startSmtpFake({ dir: mailDir });
  working = createMailSender({ kind: "fake", host: "127.0.0.1", port: fake.port, dir: mailDir })!;
  refused = createMailSender({ kind: "fake", host: "127.0.0.1", port: await closedPort(), dir: mailDir })!;
});
afterAll(async () => {
  await fake.stop();
  closeDb();
  rmSync(dir, { recursive: true, force: true });
});
// Failed attempts are logged by design; keep the output quiet and let the tests read the log.
let warn: ReturnType<typeof vi.spyOn>;
let error: ReturnType<typeof vi.spyOn>;
afterEach(() => vi.restoreAllMocks());
beforeEach(async () => {
  warn = vi.spyOn(console, "warn").mockImplementation(() => undefined);
  error = vi.spyOn(console, "error").mockImplementation(() => undefined);
  await db.delete(mailOutbox);
  for (const f of keptFiles()) rmSync(path.join(mailDir, f));
});

describe("retryDelayMs", () => {
  it("doubles from 30 s after each failed attempt and stops growing at an hour", () => {
    expect([1, 2, 3, 4].map(retryDelayMs)).toEqual([30_000, 60_000, 120_000, 240_000]);
    expect(retryDelayMs(20)).toBe(60 * 60_000);
  });
});

describe("deliverDueMail", () => {
  it("leaves a row pending with one more attempt, the error and a later due time when the server refuses the connection", async () => {
    await enqueueMail(db, [message("retry@trimrail.test")]);
    const [queued] = await rowsFor("retry@trimrail.test");
    const t0 = new Date(queued.nextAttemptAt.getTime() + 1_000);

    const tally = await deliverDueMail({ send: refused, clock: () => t0, db });
    expect(tally).toEqual({ sent: 0, retrying: 1, failed: 0 });
    const [afterFailure] = await rowsFor("retry@trimrail.test");
    expect(afterFailure.status).toBe("pending");
    expect(afterFailure.attempts).toBe(1);
    expect(afterFailure.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(afterFailure.nextAttemptAt.getTime()).toBe(t0.getTime() + MAIL_RETRY_BASE_MS);
    expect(afterFailure.sentAt).toBeNull();
    expect(warn).toHaveBeenCalledWith(expect.stringMatching(/retry@trimrail\.test failed \(attempt 1 of 8\)/));

    // Not due yet: a run before the backoff ends sends nothing, even with a working server.
    expect(await deliverDueMail({ send: working, clock: () => new Date(t0.getTime() + MAIL_RETRY_BASE_MS - 1), db })).toEqual({
      sent: 0,
      retrying: 0,
      failed: 0,
    });

    const t1 = new Date(t0.getTime() + MAIL_RETRY_BASE_MS + 1);
    expect((await deliverDueMail({ send: working, clock: () => t1, db })).sent).toBe(1);
    const [afterSuccess] = await rowsFor("retry@trimrail.test");
    expect(afterSuccess.status).toBe("sent");
    expect(afterSuccess.attempts).toBe(2);
    expect(afterSuccess.sentAt?.getTime()).toBe(t1.getTime());
    expect(afterSuccess.lastError).toBeNull();
    expect(keptFiles()).toHaveLength(1);
  });

  it(`marks a row failed after ${MAIL_MAX_ATTEMPTS} refused attempts and stops trying it`, async () => {
    await enqueueMail(db, [message("gone@trimrail.test")]);
    let now = Date.now() + 1_000;
    for (let attempt = 1; attempt <= MAIL_MAX_ATTEMPTS; attempt += 1) {
      const tally = await deliverDueMail({ send: refused, clock: () => new Date(now), db });
      expect(tally.retrying + tally.failed, `attempt ${attempt}`).toBe(1);
      now += retryDelayMs(attempt) + 1;
    }
    const [row] = await rowsFor("gone@trimrail.test");
    expect(row.status).toBe("failed");
    expect(row.attempts).toBe(MAIL_MAX_ATTEMPTS);
    expect(error).toHaveBeenCalledWith(expect.stringMatching(/gave up on password-reset .* to gone@trimrail\.test after 8 attempts/));
    expect(await deliverDueMail({ send: working, clock: () => new Date(now + 86_400_000), db })).toEqual({
      sent: 0,
      retrying: 0,
      failed: 0,
    });
    expect(keptFiles()).toHaveLength(0);
  });

  it("never delivers one row twice when two processes run at once (two connections to one database file)", async () => {
    const recipients = Array.from({ length: 30 }, (_, i) => `race-${i}@trimrail.test`);
    await enqueueMail(db, recipients.map(message));
    const second = openDatabase(databaseUrl);
    const third = openDatabase(databaseUrl);
    try {
      const clock = () => new Date(Date.now() + 1_000);
      const tallies = await Promise.all([
        deliverDueMail({ send: working, clock, db }),
        deliverDueMail({ send: working, clock, db: second.db }),
        deliverDueMail({ send: working, clock, db: third.db }),
      ]);
      expect(tallies.reduce((sum, t) => sum + t.sent, 0)).toBe(recipients.length);
    } finally {
      second.client.close();
      third.client.close();
    }
    const rows = await db.select().from(mailOutbox);
    expect(rows.every((r) => r.status === "sent" && r.attempts === 1)).toBe(true);
    expect(keptFiles()).toHaveLength(recipients.length);
  });
});

describe("claimDueMail", () => {
  it("hands a due row to one claimer only, and to another after the first claim's lease ran out", async () => {
    await enqueueMail(db, [message("lease@trimrail.test")]);
    const now = new Date(Date.now() + 1_000);
    const leaseUntil = new Date(now.getTime() + MAIL_CLAIM_LEASE_MS);
    const [first, second] = await Promise.all([
      claimDueMail({ now, leaseUntil, limit: 5, db }),
      claimDueMail({ now, leaseUntil, limit: 5, db }),
    ]);
    expect(first.length + second.length).toBe(1);

    const later = new Date(leaseUntil.getTime() + 1);
    const reclaimed = await claimDueMail({ now: later, leaseUntil: new Date(later.getTime() + MAIL_CLAIM_LEASE_MS), limit: 5, db });
    expect(reclaimed.map((r) => r.attempts)).toEqual([2]);
  });
});
