import { createClient, type Client } from "@libsql/client";
import { drizzle, type LibSQLDatabase } from "drizzle-orm/libsql";
import * as schema from "./schema";

export type Database = LibSQLDatabase<typeof schema>;

export const DEFAULT_DATABASE_URL = "file:./data/trimrail.db";

/** Opens a database at `url` (a libSQL URL; a local file by default) with the pragmas we rely on. */
export function openDatabase(url: string = process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL): {
  db: Database;
  client: Client;
} {
  const client = createClient({ url });
  // The local libSQL client runs these at once on its single connection, before any query below.
  // WAL lets the server read while a seed writes; SQLite leaves foreign keys off unless asked.
  for (const pragma of ["PRAGMA journal_mode = WAL", "PRAGMA busy_timeout = 5000", "PRAGMA foreign_keys = ON"]) {
    client.execute(pragma).catch((error: unknown) => console.error(`[db] ${pragma} failed`, error));
  }
  return { db: drizzle(client, { schema }), client };
}

const globalForDb = globalThis as unknown as { trimrailDb?: Database };

/** The app's shared connection, opened once per process. */
export function getDb(): Database {
  globalForDb.trimrailDb ??= openDatabase().db;
  return globalForDb.trimrailDb;
}
