import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { checkDatabaseHealth } from "@/db/health";
import { openDatabase } from "@/db/index";
import { migrateDatabase } from "@/db/migrate";

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-health-"));
const migrated = path.join(dir, "migrated.db");
const frozen = path.join(dir, "frozen", "app.db");

/** Makes a file unwritable even for root (the tests run as root in CI): the immutable attribute. */
const setImmutable = (file: string, on: boolean) => {
  const result = spawnSync("chattr", [on ? "+i" : "-i", file], { encoding: "utf8" });
  if (result.status !== 0) throw new Error(`chattr failed: ${result.stderr}`);
};

beforeAll(async () => {
  const { db, client } = openDatabase(`file:${migrated}`);
  await migrateDatabase(db);
  // Into the main file, so a copy of the file alone is the whole database.
  await client.execute("PRAGMA wal_checkpoint(TRUNCATE)");
  client.close();
});
afterAll(() => {
  try {
    setImmutable(frozen, false);
  } catch {
    // never made
  }
  rmSync(dir, { recursive: true, force: true });
});

describe("checkDatabaseHealth", () => {
  it("returns ready for a migrated, writable database", async () => {
    const health = await checkDatabaseHealth(`file:${migrated}`);
    expect(health).toMatchObject({ state: "ready" });
    expect(health.appliedMigrations).toBe(health.expectedMigrations);
  });

  it("returns not-migrated for an empty file, naming the command that mends it", async () => {
    const empty = path.join(dir, "empty.db");
    writeFileSync(empty, "");
    const health = await checkDatabaseHealth(`file:${empty}`);
    expect(health.state).toBe("not-migrated");
    expect(health.message).toContain("npm run db:migrate");
  });

  it("returns migrations-behind when the last migration has not been applied", async () => {
    const behind = path.join(dir, "behind.db");
    const { db, client } = openDatabase(`file:${behind}`);
    await migrateDatabase(db);
    await client.execute("delete from __drizzle_migrations where rowid = (select max(rowid) from __drizzle_migrations)");
    client.close();
    const health = await checkDatabaseHealth(`file:${behind}`);
    expect(health.state).toBe("migrations-behind");
    expect(health.appliedMigrations).toBe(health.expectedMigrations - 1);
  });

  it("returns unreachable when the database's folder does not exist", async () => {
    expect((await checkDatabaseHealth(`file:${path.join(dir, "no-such-folder", "app.db")}`)).state).toBe("unreachable");
  });

  it("returns read-only, with the file named, when the file cannot be written", async () => {
    const { mkdirSync, copyFileSync } = await import("node:fs");
    mkdirSync(path.dirname(frozen), { recursive: true });
    copyFileSync(migrated, frozen);
    setImmutable(frozen, true);
    const health = await checkDatabaseHealth(`file:${frozen}`);
    expect(health.state).toBe("read-only");
    expect(health.message).toContain(frozen);
  });
});
