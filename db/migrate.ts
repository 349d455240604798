import path from "node:path";
import { migrate } from "drizzle-orm/libsql/migrator";
import { installDerivedTables } from "./derived-tables";
import type { Database } from "./index";

export const MIGRATIONS_FOLDER = path.join(process.cwd(), "db", "migrations");

/** Applies every committed drizzle-kit migration that the database has not seen yet, then the derived tables' triggers. */
export async function migrateDatabase(db: Database): Promise<void> {
  await migrate(db, { migrationsFolder: MIGRATIONS_FOLDER });
  await installDerivedTables(db);
}
