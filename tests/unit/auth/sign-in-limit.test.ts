import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openDatabase } from "@/db/index";
import { migrateDatabase } from "@/db/migrate";

// The limit's counting against a real SQLite file, with the clock passed in.

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-sign-in-limit-"));
const url = `file:${path.join(dir, "limit.db")}`;
process.env.DATABASE_URL = url;
process.env.TRIMRAIL_SIGN_IN_WINDOW_S = "60";
process.env.TRIMRAIL_SIGN_IN_MAX = "5";
process.env.TRIMRAIL_SIGN_IN_ACCOUNT_MAX = "3";
const { beginSignInAttempt, endSignInAttempt, forgetAccountFailures, SIGN_IN_LIMITS } = await import("@/lib/auth/sign-in-limit");

const { db, client } = openDatabase(url);
beforeAll(async () => {
  await migrateDatabase(db);
});
afterAll(() => {
  client.close();
  rmSync(dir, { recursive: true, force: true });
});

const at = (seconds: number) => new Date(Date.UTC(2026, 5, 1, 12, 0, 0) + seconds * 1000);
const rowCount = async () => Number((await client.execute("select count(*) as n from sign_in_attempts")).rows[0].n);

/** One attempt with its outcome; returns whether it was let through to the password check. */
async function attempt(address: string | null, email: string | null, outcome: "wrong-password" | "signed-in" | "other", now: Date) {
  const verdict = await beginSignInAttempt({ address, email, now });
  if (verdict.allowed) await endSignInAttempt(verdict.attempt, outcome, now);
  return verdict;
}

describe("the sign-in limit", () => {
  it("reads its figures from the environment", () => {
    expect(SIGN_IN_LIMITS).toEqual({ windowMs: 60_000, addressFailures: 5, accountFailures: 3 });
  });

  it("locks one account after its failures from many addresses, with the time left, and lets other accounts through", async () => {
    const email = "many-addresses@trimrail.test";
    for (let i = 0; i < 3; i += 1) expect((await attempt(`203.0.113.${i + 1}`, email, "wrong-password", at(i))).allowed).toBe(true);
    const locked = await attempt("203.0.113.50", ` Many-Addresses@Trimrail.test `, "wrong-password", at(10));
    expect(locked).toEqual({ allowed: false, retryAfterS: 50 });
    // The refused attempt did not count against the fresh address.
    for (let i = 0; i < 5; i += 1)
      expect((await attempt("203.0.113.50", `other-${i}@trimrail.test`, "wrong-password", at(11))).allowed).toBe(true);
    expect((await attempt("203.0.113.50", "one-more@trimrail.test", "wrong-password", at(12))).allowed).toBe(false);
    // After the window the account may try again.
    expect((await attempt("203.0.113.60", email, "wrong-password", at(61))).allowed).toBe(true);
  });

  it("never counts successes, and a success clears the account's failures", async () => {
    const email = "often@trimrail.test";
    for (let i = 0; i < 30; i += 1) expect((await attempt("198.51.100.1", email, "signed-in", at(100 + i))).allowed, `#${i}`).toBe(true);
    for (let i = 0; i < 2; i += 1) await attempt("198.51.100.2", email, "wrong-password", at(140));
    await attempt("198.51.100.2", email, "signed-in", at(141));
    for (let i = 0; i < 3; i += 1) expect((await attempt("198.51.100.3", email, "wrong-password", at(142))).allowed).toBe(true);
    expect((await attempt("198.51.100.3", email, "wrong-password", at(143))).allowed).toBe(false);
    await forgetAccountFailures("OFTEN@trimrail.test");
    expect((await attempt("198.51.100.4", email, "other", at(144))).allowed).toBe(true);
  });

  it("counts parallel attempts before their outcome, so a burst gets no more guesses than the limit", async () => {
    const verdicts = await Promise.all(
      Array.from({ length: 12 }, (_, i) => beginSignInAttempt({ address: "192.0.2.99", email: `burst-${i}@trimrail.test`, now: at(200) })),
    );
    expect(verdicts.filter((v) => v.allowed)).toHaveLength(5);
  });

  it("deletes rows whose window has ended, so many distinct keys do not pile up", async () => {
    for (let i = 0; i < 40; i += 1) await attempt(`192.0.2.${i + 1}`, `flood-${i}@trimrail.test`, "wrong-password", at(300));
    expect(await rowCount()).toBeGreaterThanOrEqual(80);
    await attempt("192.0.2.200", "late@trimrail.test", "wrong-password", at(361));
    expect(await rowCount()).toBe(2);
  });
  it("starts a window at the first wrong password, however long a run of successes came before", async () => {
    const address = "198.51.100.40";
    // 100 s of successes, longer than the 60 s window; then the limit's five failures just before
    // a minute boundary of those successes, and one more just after it.
    for (let i = 0; i < 50; i += 1) await attempt(address, "runner@trimrail.test", "signed-in", at(1000 + i * 2));
    for (let i = 0; i < 5; i += 1) await attempt(address, `runner-${i}@trimrail.test`, "wrong-password", at(1115 + i));
    expect((await attempt(address, "runner-last@trimrail.test", "wrong-password", at(1121))).allowed).toBe(false);
  });
});
