import "server-only";
import { createHash } from "node:crypto";
import { clearSignInFailures, countSignInAttempt, uncountSignInAttempt } from "@/db/queries/sign-in-attempts";

// Wrong passwords are limited twice: per client address (one machine guessing many accounts) and
// per account (many machines guessing one). Only wrong passwords count: an attempt is counted
// before the password is checked, so parallel guesses cannot all pass a stale count, and is taken
// back once it turns out to be anything else (a success, a malformed request, an unverified
// address). A success also clears the account's failures. Common practice for the figures.

const envNumber = (name: string, fallback: number): number => {
  const value = Number(process.env[name]);
  return Number.isFinite(value) && value > 0 ? value : fallback;
};

export const SIGN_IN_LIMITS = {
  windowMs: envNumber("TRIMRAIL_SIGN_IN_WINDOW_S", 15 * 60) * 1000,
  addressFailures: envNumber("TRIMRAIL_SIGN_IN_MAX", 20),
  accountFailures: envNumber("TRIMRAIL_SIGN_IN_ACCOUNT_MAX", 10),
};

export const addressKey = (address: string): string => `address:${address}`;

/** Accounts by a hash of the trimmed, lower-cased address: the table keeps no typed addresses. */
export const accountKey = (email: string): string => `account:${createHash("sha256").update(email.trim().toLowerCase()).digest("hex")}`;

export interface SignInAttempt {
  keys: string[];
  accountKey: string | null;
}

export type AttemptVerdict = { allowed: true; attempt: SignInAttempt } | { allowed: false; retryAfterS: number };

/** Counts a sign-in attempt from `address` (null: unknown) for `email` (null: none given). */
export async function beginSignInAttempt({
  address,
  email,
  now = new Date(),
}: {
  address: string | null;
  email: string | null;
  now?: Date;
}): Promise<AttemptVerdict> {
  // An unknown address shares one key: the hook could not resolve it (the server was starting).
  const byAddress = addressKey(address ?? "unknown");
  const account = email ? accountKey(email) : null;
  const keys = account ? [byAddress, account] : [byAddress];
  const counts = await countSignInAttempt({ keys, windowMs: SIGN_IN_LIMITS.windowMs, now });
  const limitOf = (key: string) => (key === byAddress ? SIGN_IN_LIMITS.addressFailures : SIGN_IN_LIMITS.accountFailures);
  const over = counts.filter((c) => c.failures > limitOf(c.key));
  if (over.length === 0) return { allowed: true, attempt: { keys, accountKey: account } };
  // Refused before the password was looked at: it must not count against the keys still open.
  const open = keys.filter((k) => !over.some((c) => c.key === k));
  await uncountSignInAttempt({ keys: open, now });
  const latestEnd = Math.max(...over.map((c) => c.windowEndsAt.getTime()));
  return { allowed: false, retryAfterS: Math.max(1, Math.ceil((latestEnd - now.getTime()) / 1000)) };
}

/** Settles a counted attempt once its outcome is known: only a wrong password keeps counting. */
export async function endSignInAttempt(
  attempt: SignInAttempt,
  outcome: "wrong-password" | "signed-in" | "other",
  now = new Date(),
): Promise<void> {
  if (outcome === "wrong-password") return;
  await uncountSignInAttempt({ keys: attempt.keys, now });
  if (outcome === "signed-in" && attempt.accountKey) await clearSignInFailures({ key: attempt.accountKey });
}

/** After a password reset the account starts with a clean slate. */
export async function forgetAccountFailures(email: string): Promise<void> {
  await clearSignInFailures({ key: accountKey(email) });
}

/** The 429 message, with the wait in words. */
export function tooManyAttemptsMessage(retryAfterS: number): string {
  const minutes = Math.ceil(retryAfterS / 60);
  const wait = retryAfterS < 90 ? `${retryAfterS} seconds` : `${minutes} minutes`;
  return `Too many failed sign-in attempts. Try again in ${wait}, or reset your password from "Forgot your password?".`;
}
