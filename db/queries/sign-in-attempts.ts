import "server-only";
import { and, eq, gt, inArray, lte, sql } from "drizzle-orm";
import { getDb } from "@/db";
import { signInAttempts } from "@/db/schema";

export interface SignInCount {
  key: string;
  failures: number;
  windowEndsAt: Date;
}

/**
 * Counts one attempt against each key: a key without a row starts a window of `windowMs`; the
 * others add one. Rows whose window ended are deleted first, so the table holds only keys seen
 * within the current window. Each statement is atomic on its own (an UPSERT), so two requests in
 * parallel both count. Returns every key's count after this attempt.
 */
export async function countSignInAttempt({
  keys,
  windowMs,
  now,
}: {
  keys: readonly string[];
  windowMs: number;
  now: Date;
}): Promise<SignInCount[]> {
  const db = getDb();
  await deleteEndedSignInWindows({ now });
  const ends = new Date(now.getTime() + windowMs);
  const counts: SignInCount[] = [];
  for (const key of keys) {
    const [row] = await db
      .insert(signInAttempts)
      .values({ key, failures: 1, windowEndsAt: ends })
      .onConflictDoUpdate({
        target: signInAttempts.key,
        // A window that ended since the delete above starts afresh rather than adding to the old.
        set: {
          failures: sql`CASE WHEN ${signInAttempts.windowEndsAt} <= ${now.getTime()} THEN 1 ELSE ${signInAttempts.failures} + 1 END`,
          windowEndsAt: sql`CASE WHEN ${signInAttempts.windowEndsAt} <= ${now.getTime()} THEN ${ends.getTime()} ELSE ${signInAttempts.windowEndsAt} END`,
        },
      })
      .returning();
    counts.push(row);
  }
  return counts;
}

/** Deletes every row whose window has ended. */
export async function deleteEndedSignInWindows({ now }: { now: Date }): Promise<void> {
  await getDb().delete(signInAttempts).where(lte(signInAttempts.windowEndsAt, now));
}

/**
 * Takes back the attempt counted against each key: it turned out not to be a wrong password. A key
 * left with no failures is deleted, so a window always starts at a wrong password, never at an
 * attempt that was taken back (else a run of successes would age the window of later failures).
 */
export async function uncountSignInAttempt({ keys, now }: { keys: readonly string[]; now: Date }): Promise<void> {
  if (keys.length === 0) return;
  const db = getDb();
  const these = inArray(signInAttempts.key, [...keys]);
  await db
    .update(signInAttempts)
    .set({ failures: sql`max(${signInAttempts.failures} - 1, 0)` })
    .where(and(these, gt(signInAttempts.windowEndsAt, now)));
  await db.delete(signInAttempts).where(and(these, lte(signInAttempts.failures, 0)));
}

/** Forgets a key's failures (an account after a successful sign-in or a password reset). */
export async function clearSignInFailures({ key }: { key: string }): Promise<void> {
  await getDb().delete(signInAttempts).where(eq(signInAttempts.key, key));
}
