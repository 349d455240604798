import { copyFileSync, mkdirSync, mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openDatabase } from "@/db/index";
import { migrateDatabase } from "@/db/migrate";
import { exitWithin, setImmutable, startBuiltServer, waitForAnswer, type BuiltServer } from "../support/built-server";

// The built server on databases it cannot use: it must refuse to start with one plain line and a
// non-zero exit, not say Ready and then answer 500 to everything; and its health route must tell
// when the database stops taking writes while it serves.

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-start-up-"));
const migrated = path.join(dir, "migrated.db");
const frozenFiles: string[] = [];
const servers: BuiltServer[] = [];

function copyOfMigrated(name: string): string {
  const folder = path.join(dir, name);
  mkdirSync(folder);
  const file = path.join(folder, "app.db");
  copyFileSync(migrated, file);
  return file;
}

async function refusal(databaseUrl: string): Promise<{ code: number | null | "still running"; lines: string[] }> {
  const server = await startBuiltServer(databaseUrl);
  servers.push(server);
  const code = await exitWithin(server, 60_000);
  const lines = server
    .stderr()
    .split("\n")
    .filter((line) => line.trim() !== "");
  return { code, lines };
}

beforeAll(async () => {
  const { db, client } = openDatabase(`file:${migrated}`);
  await migrateDatabase(db);
  await client.execute("PRAGMA wal_checkpoint(TRUNCATE)");
  client.close();
});

afterAll(() => {
  for (const server of servers) server.stop();
  for (const file of frozenFiles) setImmutable(file, false);
  rmSync(dir, { recursive: true, force: true });
});

describe("start-up on a database it cannot use", () => {
  it("exits non-zero with one clear line when the database is read-only", async () => {
    const file = copyOfMigrated("read-only");
    setImmutable(file, true);
    frozenFiles.push(file);
    const { code, lines } = await refusal(`file:${file}`);
    expect(code).not.toBe("still running");
    expect(code).not.toBe(0);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^\[trimrail\] not starting: .*read-only/i);
    expect(lines[0]).not.toMatch(/\bat .*\.js:\d+/);
  });

  it("exits non-zero with one clear line when the database's folder does not exist", async () => {
    const { code, lines } = await refusal(`file:${path.join(dir, "no-such-folder", "app.db")}`);
    expect(code).not.toBe("still running");
    expect(code).not.toBe(0);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^\[trimrail\] not starting: /);
  });

  it("exits non-zero with one clear line when the database has no migrations", async () => {
    const { code, lines } = await refusal(`file:${path.join(dir, "empty.db")}`);
    expect(code).not.toBe("still running");
    expect(code).not.toBe(0);
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/^\[trimrail\] not starting: .*migrat/i);
  });
});

describe("GET /api/health while serving", () => {
  it("answers 200 ready, then 503 read-only once the file stops taking writes", async () => {
    const file = copyOfMigrated("serving");
    const server = await startBuiltServer(`file:${file}`);
    servers.push(server);
    const ready = await waitForAnswer(server, "/api/health", 60_000);
    expect(ready.status).toBe(200);
    expect(await ready.json()).toMatchObject({ database: { state: "ready" } });

    setImmutable(file, true);
    frozenFiles.push(file);
    const frozen = await fetch(`${server.baseURL}/api/health`);
    expect(frozen.status).toBe(503);
    expect(JSON.stringify(await frozen.json())).toContain('"state":"read-only"');
  });
});
