import { createHash } from "node:crypto";
import type { Client } from "@libsql/client";

// A fingerprint of what the database holds, table by table, to show that a run of refused
// requests wrote nothing. Some tables change for reasons that are no write of the request's own:
// they are left out or read in part, and each says why.

/** Tables whose rows a refused request legitimately touches. */
export const TABLES_LEFT_OUT: Record<string, string> = {
  session:
    "signing in (the test's own clients) adds rows, signing out removes one, and better-auth refreshes a session's expiry as it is used",
  rate_limit: "better-auth counts every request to its endpoints per client address, refused or not",
  sign_in_attempts: "a refused sign-in (a wrong password) is counted per client address and per account: that is the sign-in limit",
};

/** Tables read without the columns that change after the request is over. */
export const COLUMNS_LEFT_OUT: Record<string, { columns: string[]; why: string }> = {
  mail_outbox: {
    columns: ["status", "attempts", "next_attempt_at", "last_error", "sent_at"],
    why: "the delivery loop sends (and retries) mail that earlier tests queued; a new message would still show as a new row",
  },
};

export type DatabaseDigest = Record<string, string>;

/** One hash per table: its rows (every column but those left out), in a fixed order. */
export async function digestDatabase(client: Client): Promise<DatabaseDigest> {
  const tables = await client.execute("select name from sqlite_master where type = 'table' and name not like 'sqlite_%' order by name");
  const digest: DatabaseDigest = {};
  for (const { name } of tables.rows) {
    const table = String(name);
    if (table in TABLES_LEFT_OUT) continue;
    const rows = await client.execute(`select * from "${table}"`);
    const skipped = new Set(COLUMNS_LEFT_OUT[table]?.columns ?? []);
    const lines = rows.rows.map((row) => JSON.stringify(rows.columns.filter((c) => !skipped.has(c)).map((c) => String(row[c])))).sort();
    digest[table] = `${lines.length}:${createHash("sha256").update(lines.join("\n")).digest("hex").slice(0, 16)}`;
  }
  return digest;
}

/** The tables whose digest differs, e.g. ["setups: 17:ab… → 18:cd…"]; empty when nothing changed. */
export function changedTables(before: DatabaseDigest, after: DatabaseDigest): string[] {
  const names = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort();
  return names.filter((n) => before[n] !== after[n]).map((n) => `${n}: ${before[n]} → ${after[n]}`);
}
