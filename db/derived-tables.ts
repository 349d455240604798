import { createHash } from "node:crypto";
import { sql } from "drizzle-orm";
import type { Database } from "./index";
import { insightRollupBackfill, insightRollupTriggers } from "./insight-rollup-sql";
import { setupSearchBackfill, setupSearchTable, setupSearchTriggers } from "./setup-search-sql";

// Triggers, and the tables they fill, built from TypeScript (db/insight-rollup-sql.ts,
// db/setup-search-sql.ts) rather than written out in a migration: one definition serves the
// triggers and the backfill. A database whose stamp differs from the current definition (a new one,
// or one from before these tables) gets the triggers replaced and every derived row counted afresh,
// in one transaction, the next time it is migrated.

const STAMP_NAME = "insight-rollups-and-setup-search";

type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

function definition(): { structure: string[]; backfill: string[] } {
  return {
    structure: [...setupSearchTable(), ...insightRollupTriggers(), ...setupSearchTriggers()],
    backfill: [...insightRollupBackfill(), ...setupSearchBackfill()],
  };
}

export function derivedStamp(): string {
  const { structure, backfill } = definition();
  return createHash("sha256")
    .update([...structure, ...backfill].join("\n"))
    .digest("hex")
    .slice(0, 16);
}

/** Installs the current triggers and rebuilds the derived rows when the database carries another definition; true when it did. */
export async function installDerivedTables(db: Database, { force = false }: { force?: boolean } = {}): Promise<boolean> {
  const stamp = derivedStamp();
  const [current] = await db.all<{ stamp: string }>(sql`select stamp from derived_stamps where name = ${STAMP_NAME}`);
  if (!force && current?.stamp === stamp) return false;
  const { structure, backfill } = definition();
  await db.transaction(async (tx) => {
    await dropDerivedTriggers(tx);
    for (const statement of [...structure, ...backfill]) await tx.run(sql.raw(statement));
    await tx.run(
      sql`insert into derived_stamps (name, stamp) values (${STAMP_NAME}, ${stamp}) on conflict (name) do update set stamp = excluded.stamp`,
    );
  });
  return true;
}

async function dropDerivedTriggers(tx: Tx): Promise<void> {
  const old = await tx.all<{ name: string }>(
    sql`select name from sqlite_master where type = 'trigger' and name like 'derived\_%' escape '\\'`,
  );
  for (const { name } of old) await tx.run(sql.raw(`drop trigger "${name.replace(/"/g, '""')}"`));
}

/**
 * For a bulk load (seed:large): writes with the derived triggers off, then counts every row once,
 * which is many times faster than a trigger per row. The stamp goes first, so a load that stops
 * halfway leaves a database that the next migration rebuilds.
 */
export async function loadThenRebuildDerivedTables<T>(db: Database, load: () => Promise<T>): Promise<T> {
  await db.transaction(async (tx) => {
    await tx.run(sql`delete from derived_stamps where name = ${STAMP_NAME}`);
    await dropDerivedTriggers(tx);
  });
  const loaded = await load();
  await installDerivedTables(db, { force: true });
  return loaded;
}
