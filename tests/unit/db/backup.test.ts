import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { openDatabase } from "@/db/index";
import { migrateDatabase } from "@/db/migrate";
import { seedDemo } from "@/db/seed";

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-backup-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const run = (script: string, args: string[], databaseUrl: string) =>
  spawnSync("npx", ["tsx", `scripts/${script}.ts`, ...args], {
    encoding: "utf8",
    env: { ...process.env, DATABASE_URL: databaseUrl },
    timeout: 60_000,
  });

async function names(url: string): Promise<string[]> {
  const { client } = openDatabase(url);
  const rows = await client.execute("select name from setups order by id");
  client.close();
  return rows.rows.map((r) => String(r.name));
}

describe("db:backup and db:restore", () => {
  it("returns the backed-up rows after a restore, though the live database changed while and after it was copied", async () => {
    const url = `file:${path.join(dir, "live.db")}`;
    const { db, client } = openDatabase(url);
    await migrateDatabase(db);
    await seedDemo(db);
    const before = await names(url);

    // A writer keeps changing the live database while the backup runs (as a serving app would).
    let writes = 0;
    let stop = false;
    const writer = (async () => {
      while (!stop) {
        await client.execute({ sql: "update setups set name = name || '' where id = ?", args: ["set-wren-whip"] });
        writes += 1;
        await new Promise((r) => setTimeout(r, 1));
      }
    })();
    const backupFile = path.join(dir, "copy.db");
    const backup = run("db-backup", [backupFile], url);
    stop = true;
    await writer;
    expect(backup.status, backup.stderr).toBe(0);
    expect(backup.stdout).toContain(backupFile);
    expect(writes).toBeGreaterThan(0);

    await client.execute("update setups set name = 'changed after the backup'");
    client.close();
    expect(new Set(await names(url))).toEqual(new Set(["changed after the backup"]));

    const restore = run("db-restore", [backupFile], url);
    expect(restore.status, restore.stderr).toBe(0);
    expect(await names(url)).toEqual(before);
  }, 90_000);

  it("returns a non-zero exit and a message for a backup file that is not a database, and leaves the live one alone", async () => {
    const url = `file:${path.join(dir, "live2.db")}`;
    const { db, client } = openDatabase(url);
    await migrateDatabase(db);
    await seedDemo(db);
    client.close();
    const before = await names(url);
    const bogus = path.join(dir, "bogus.db");
    (await import("node:fs")).writeFileSync(bogus, "not a database at all");
    const restore = run("db-restore", [bogus], url);
    expect(restore.status).not.toBe(0);
    expect(restore.stderr).toMatch(/restore failed/);
    expect(await names(url)).toEqual(before);
    expect(run("db-restore", [], url).status).toBe(2);
  }, 90_000);
});
