import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openDatabase } from "@/db/index";
import { migrateDatabase } from "@/db/migrate";
import { seedDemo } from "@/db/seed";
import { seedLarge } from "@/db/seed-large";
import type { QueueFilter } from "@/db/queries/review";

// The Review desk's search checked against the same question answered in plain JS over every row:
// which submitted setups have the text in their name or their owner's name, in which order.

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-queue-search-"));
const url = `file:${path.join(dir, "queue.db")}`;
process.env.DATABASE_URL = url;
const { listQueue } = await import("@/db/queries/review");

interface Row {
  id: string;
  name: string;
  owner_name: string;
  submitted_at: number | null;
}
let rows: Row[] = [];

beforeAll(async () => {
  const { db, client } = openDatabase(url);
  await migrateDatabase(db);
  await seedDemo(db);
  await seedLarge(db, { setups: 1_500, customers: 60 });
  rows = (await client.execute("select s.id, s.name, u.name as owner_name, s.submitted_at from setups s join user u on u.id = s.owner_id"))
    .rows as unknown as Row[];
  client.close();
}, 60_000);
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const base: QueueFilter = { status: null, worst: null, modelId: null, q: null, sort: "waiting", dir: "desc", page: 1, pageSize: 25 };

/** Plain JS: submitted setups whose name or owner's name holds the text (any case), oldest submission first. */
function reference(q: string): string[] {
  const needle = q.toLowerCase();
  return rows
    .filter((r) => r.submitted_at !== null)
    .filter((r) => r.name.toLowerCase().includes(needle) || r.owner_name.toLowerCase().includes(needle))
    .sort((a, b) => (a.submitted_at as number) - (b.submitted_at as number) || a.id.localeCompare(b.id))
    .map((r) => r.id);
}

// Texts that match through the name index, through owners' names, through both, and not at all.
const firstOwnerWord = () => rows.find((r) => r.id.startsWith("set-large-"))?.owner_name.split(" ")[0] ?? "";
const searches = () => ["orchard", "relay", firstOwnerWord(), "Kasper", "ay", "no such text anywhere"];

/** One page of listQueue's answer for `q` against the same page of the reference, and its total. */
async function expectReferencePage(q: string, page: number, pageSize: number): Promise<void> {
  const expected = reference(q);
  const found = await listQueue({ ...base, q, page, pageSize });
  expect(found.total, q).toBe(expected.length);
  expect(
    found.rows.map((r) => r.id),
    `${q}, page ${page}`,
  ).toEqual(expected.slice((page - 1) * pageSize, page * pageSize));
}

describe("listQueue with a search", () => {
  it("returns the same setups, in the same order and with the same total, as the plain-JS reference", async () => {
    for (const q of searches()) {
      await expectReferencePage(q, 1, 25);
      if (reference(q).length > 25) await expectReferencePage(q, 2, 25);
    }
  });

  it("returns the full total with no rows for a page past the end of the matches", async () => {
    const q = searches().find((text) => reference(text).length > 0) as string;
    const expected = reference(q);
    const past = await listQueue({ ...base, q, page: Math.ceil(expected.length / 25) + 1 });
    expect(past.rows).toEqual([]);
    expect(past.total).toBe(expected.length);
  });

  it("returns the plain-JS answer for texts that mean something to the index's query syntax", async () => {
    for (const q of ['"', 'ay"', "rel*", "NEAR(relay)", "relay OR dune", "(((", "-dune", "ß"]) await expectReferencePage(q, 1, 100);
  });

  it("returns a total of 0 and no rows when nothing matches", async () => {
    expect(await listQueue({ ...base, q: "no such text anywhere" })).toEqual({ rows: [], total: 0 });
  });
});
