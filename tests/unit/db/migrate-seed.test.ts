import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, describe, expect, it } from "vitest";
import { openDatabase } from "@/db/index";
import { migrateDatabase } from "@/db/migrate";
import { seedDemo } from "@/db/seed";
import { DEMO_SETUPS, DEMO_USERS } from "@/db/seed-data";

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-unit-db-"));
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const TABLES = [
  "user",
  "account",
  "envelope_models",
  "envelope_units",
  "mounts",
  "adapters",
  "payload_templates",
  "setups",
  "setup_payloads",
  "comments",
  "decisions",
  "setup_results",
  "setup_flags",
] as const;

async function dumpTables(client: ReturnType<typeof openDatabase>["client"]): Promise<Record<string, unknown[]>> {
  const out: Record<string, unknown[]> = {};
  for (const table of TABLES) {
    // The password hash is salted per insert: compare it by presence, the rest byte for byte.
    const order = table === "setup_results" ? "setup_id" : table === "setup_flags" ? "setup_id, code, level" : "id";
    const rows = (await client.execute(`select * from "${table}" order by ${order}`)).rows.map((row) => {
      const copy: Record<string, unknown> = { ...row };
      if ("password" in copy) copy.password = copy.password ? "<hash>" : null;
      return copy;
    });
    out[table] = rows;
  }
  return out;
}

describe("migrateDatabase", () => {
  it("creates every table on an empty database file", async () => {
    const { db, client } = openDatabase(`file:${path.join(dir, "empty.db")}`);
    await migrateDatabase(db);
    const names = (await client.execute("select name from sqlite_master where type = 'table'")).rows.map((r) => r.name);
    for (const table of [...TABLES, "session", "verification", "rate_limit", "attachments", "audit_log"]) {
      expect(names).toContain(table);
    }
    client.close();
  });

  it("rejects a value outside an enum column's list", async () => {
    const { db, client } = openDatabase(`file:${path.join(dir, "check.db")}`);
    await migrateDatabase(db);
    await expect(
      client.execute(
        "insert into mounts (id, name, thread, mass_kg, rated_load_kg, safety_line_breaking_load_n) values ('m', 'm', 'M6', 0.1, 1, 100)",
      ),
    ).rejects.toThrow(/CHECK constraint failed/);
    client.close();
  });
});

describe("seedDemo", () => {
  it("builds the demo scenario and gives the same rows when run twice", async () => {
    const { db, client } = openDatabase(`file:${path.join(dir, "seed.db")}`);
    await migrateDatabase(db);
    await seedDemo(db);
    const first = await dumpTables(client);
    await seedDemo(db);
    const second = await dumpTables(client);
    expect(second).toEqual(first);

    // The scenario the foundation asks for: 3 models, 6 units, 10 templates, 4 + 2 + 1 people, 20 setups.
    expect(first.envelope_models).toHaveLength(3);
    expect(first.envelope_units).toHaveLength(6);
    expect(first.payload_templates).toHaveLength(10);
    expect(first.user).toHaveLength(DEMO_USERS.length);
    const roles = first.user.map((u) => (u as { role: string }).role);
    expect(roles.filter((r) => r === "customer")).toHaveLength(4);
    expect(roles.filter((r) => r === "support")).toHaveLength(2);
    expect(roles.filter((r) => r === "maker")).toHaveLength(1);
    expect(first.setups).toHaveLength(DEMO_SETUPS.length);
    expect(DEMO_SETUPS.length).toBeGreaterThanOrEqual(20);
    const statuses = new Set(first.setups.map((s) => (s as { status: string }).status));
    expect([...statuses].sort()).toEqual(["approved", "changes_requested", "draft", "submitted"]);
    // Every setup carries the server's own evaluation, its worst flag, and one flag row per distinct caution or stop.
    const results = new Map(
      (first.setup_results as Array<{ setup_id: string; result_json: string }>).map((r) => [
        r.setup_id,
        JSON.parse(r.result_json) as { grossLiftKg: number; flags: Array<{ code: string; level: string }> },
      ]),
    );
    for (const row of first.setups as Array<{ id: string; worst_flag: string }>) {
      const result = results.get(row.id);
      expect(result, row.id).toBeDefined();
      expect(Number.isFinite(result?.grossLiftKg)).toBe(true);
      expect(["ok", "caution", "stop"]).toContain(row.worst_flag);
      const flagRows = (first.setup_flags as Array<{ setup_id: string; code: string; level: string }>)
        .filter((f) => f.setup_id === row.id)
        .map((f) => `${f.code}:${f.level}`);
      expect(flagRows.sort()).toEqual(
        [...new Set(result?.flags.filter((f) => f.level !== "ok").map((f) => `${f.code}:${f.level}`))].sort(),
      );
    }
    client.close();
  });
});
