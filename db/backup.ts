import { createClient } from "@libsql/client";
import { copyFileSync, existsSync, renameSync, rmSync } from "node:fs";
import path from "node:path";
import { checkDatabaseHealth } from "./health";

const localPath = (url: string): string => {
  if (!url.startsWith("file:")) throw new Error(`Backups work on a local database file; ${url} is not one.`);
  return path.resolve(url.slice("file:".length).split("?")[0]);
};

/**
 * Writes a consistent copy of the live database to `to` while the app keeps serving: SQLite's
 * VACUUM INTO reads one snapshot inside a read transaction and writes a compact new file.
 */
export async function backupDatabase({ url, to }: { url: string; to: string }): Promise<{ file: string }> {
  const target = path.resolve(to);
  if (existsSync(target)) throw new Error(`${target} exists already; choose a new file name.`);
  const client = createClient({ url });
  try {
    await client.execute({ sql: "VACUUM INTO ?", args: [target] });
  } finally {
    client.close();
  }
  return { file: target };
}

/**
 * Puts a backup back in place of the database at `url`. The backup is checked first (it opens and
 * carries this app's migrations); then it replaces the file in one rename, and the old file's
 * write-ahead log goes with it. Stop the app before restoring: a running server holds the old file.
 */
export async function restoreDatabase({ url, from }: { url: string; from: string }): Promise<{ file: string }> {
  const source = path.resolve(from);
  if (!existsSync(source)) throw new Error(`No backup at ${source}.`);
  const health = await checkDatabaseHealth(`file:${source}`);
  if (health.state === "unreachable" || health.state === "not-migrated")
    throw new Error(`${source} is not a Trimrail database: ${health.message}`);
  const target = localPath(url);
  const staging = `${target}.restoring`;
  copyFileSync(source, staging);
  for (const suffix of ["-wal", "-shm"]) rmSync(`${target}${suffix}`, { force: true });
  renameSync(staging, target);
  return { file: target };
}
