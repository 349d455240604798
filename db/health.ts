import { createClient } from "@libsql/client";
import { accessSync, constants } from "node:fs";
import path from "node:path";
import journal from "./migrations/meta/_journal.json";
import { DEFAULT_DATABASE_URL } from "./index";

export type DatabaseState = "ready" | "unreachable" | "read-only" | "not-migrated" | "migrations-behind";

export interface DatabaseHealth {
  state: DatabaseState;
  /** One plain line for a person: what is wrong and what to do. */
  message: string;
  appliedMigrations: number | null;
  expectedMigrations: number;
}

const describe = (error: unknown) => (error instanceof Error ? error.message : String(error));

/**
 * For a local file: whether this process may write the file and its folder (SQLite writes its
 * journal beside it). SQLite itself would only find out at the first real write.
 */
function localWriteProblem(url: string): string | null {
  if (!url.startsWith("file:")) return null;
  const file = url.slice("file:".length).split("?")[0];
  for (const target of [file, path.dirname(path.resolve(file))]) {
    try {
      accessSync(target, constants.W_OK);
    } catch (error) {
      return `${target}: ${(error as NodeJS.ErrnoException).code ?? describe(error)}`;
    }
  }
  return null;
}

/**
 * Whether the app's database can be opened, written and is at the committed schema. It uses a
 * connection of its own (a write check opens a transaction, which must not share the app's).
 */
export async function checkDatabaseHealth(url: string = process.env.DATABASE_URL ?? DEFAULT_DATABASE_URL): Promise<DatabaseHealth> {
  const expectedMigrations = journal.entries.length;
  const at = (state: DatabaseState, message: string, appliedMigrations: number | null = null): DatabaseHealth => ({
    state,
    message,
    appliedMigrations,
    expectedMigrations,
  });
  let client;
  try {
    client = createClient({ url });
    await client.execute("select 1");
  } catch (error) {
    return at(
      "unreachable",
      `The database at ${url} cannot be opened (${describe(error)}). Check DATABASE_URL and that its folder exists.`,
    );
  }
  try {
    let applied: number;
    try {
      const rows = await client.execute("select count(*) as n from __drizzle_migrations");
      applied = Number(rows.rows[0]?.n ?? 0);
    } catch {
      return at("not-migrated", `The database at ${url} has no migrations applied: run \`npm run db:migrate\`.`, 0);
    }
    if (applied < expectedMigrations) {
      return at(
        "migrations-behind",
        `The database at ${url} has ${applied} of ${expectedMigrations} migrations: run \`npm run db:migrate\`.`,
        applied,
      );
    }
    const fileProblem = localWriteProblem(url);
    if (fileProblem)
      return at(
        "read-only",
        `The database at ${url} cannot be written (${fileProblem}). Give the server write access to the file and its folder.`,
        applied,
      );
    try {
      // Takes the write lock and lets it go: fails on a read-only connection or server.
      const tx = await client.transaction("write");
      await tx.rollback();
    } catch (error) {
      return at(
        "read-only",
        `The database at ${url} cannot be written (${describe(error)}). Give the server write access to the file and its folder.`,
        applied,
      );
    }
    return at("ready", "The database is open, writable and migrated.", applied);
  } finally {
    client.close();
  }
}
