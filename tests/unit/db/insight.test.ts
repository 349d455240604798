import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openDatabase } from "@/db/index";
import { migrateDatabase } from "@/db/migrate";
import { seedDemo } from "@/db/seed";
import type { InsightFilter } from "@/db/queries/insight";

// Insight's SQL checked against the same figures worked out in plain JS from every row of the demo.

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-insight-"));
const url = `file:${path.join(dir, "insight.db")}`;
process.env.DATABASE_URL = url;
const { getInsight } = await import("@/lib/server/insight");

interface Row {
  id: string;
  model_id: string;
  status: string;
  mount_position_x_m: number;
  payload_mass_kg: number;
  free_lift_ratio: number | null;
  created_at: number;
  rail_start_x_m: number;
  rail_end_x_m: number;
}
let rows: Row[] = [];
let payloads: Array<{ setup_id: string; mass_kg: number; category: string; template_id: string | null; template_name: string | null }> = [];
let results: Map<string, { flags: Array<{ code: string; level: string }> }>;
let decisions: Array<{ setup_id: string; outcome: string; reasons_json: string }> = [];

beforeAll(async () => {
  const { db, client } = openDatabase(url);
  await migrateDatabase(db);
  await seedDemo(db);
  rows = (await client.execute("select s.*, m.rail_start_x_m, m.rail_end_x_m from setups s join envelope_models m on m.id = s.model_id"))
    .rows as unknown as Row[];
  payloads = (
    await client.execute(
      "select p.setup_id, p.mass_kg, p.category, p.template_id, t.name as template_name from setup_payloads p left join payload_templates t on t.id = p.template_id",
    )
  ).rows as unknown as typeof payloads;
  results = new Map(
    (await client.execute("select setup_id, result_json from setup_results")).rows.map((r) => [
      String(r.setup_id),
      JSON.parse(String(r.result_json)),
    ]),
  );
  decisions = (await client.execute("select setup_id, outcome, reasons_json from decisions")).rows as unknown as typeof decisions;
  client.close();
});
afterAll(() => rmSync(dir, { recursive: true, force: true }));

const countBy = <T>(items: T[], key: (item: T) => string) =>
  items.reduce<Record<string, number>>((acc, item) => ({ ...acc, [key(item)]: (acc[key(item)] ?? 0) + 1 }), {});
const asCounts = <T extends { count: number }>(items: T[], key: (item: T) => string) =>
  Object.fromEntries(items.map((i) => [key(i), i.count]));
const bin = (value: number, width: number) => Math.floor(value / width);

function reference(filter: InsightFilter) {
  const keep = rows.filter(
    (r) =>
      (!filter.modelId || r.model_id === filter.modelId) &&
      (!filter.from || r.created_at >= Date.parse(`${filter.from}T00:00:00Z`)) &&
      (!filter.to || r.created_at < Date.parse(`${filter.to}T00:00:00Z`) + 86_400_000),
  );
  const ids = new Set(keep.map((r) => r.id));
  const items = payloads.filter((p) => ids.has(p.setup_id));
  return {
    payloadMass: countBy(items, (p) => `${bin(p.mass_kg, 0.05)}:${p.category}`),
    setupPayloadMass: countBy(keep, (r) => String(bin(r.payload_mass_kg, 0.1))),
    templates: countBy(
      items.filter((p) => p.template_id),
      (p) => `${p.template_id}:${p.template_name}`,
    ),
    rail: countBy(
      keep,
      (r) =>
        `${r.model_id}:${Math.max(0, Math.min(9, Math.floor(((r.mount_position_x_m - r.rail_start_x_m) / (r.rail_end_x_m - r.rail_start_x_m)) * 10)))}`,
    ),
    freeLift: countBy(
      keep.filter((r) => r.free_lift_ratio !== null),
      (r) => String(bin(r.free_lift_ratio as number, 0.05)),
    ),
    flags: countBy(
      keep.flatMap((r) => [
        ...new Set((results.get(r.id)?.flags ?? []).filter((f) => f.level !== "ok").map((f) => `${f.code}:${f.level}`)),
      ]),
      (k) => k,
    ),
    months: countBy(keep, (r) => `${new Date(r.created_at).toISOString().slice(0, 7)}:${r.status}`),
    reasons: countBy(
      decisions
        .filter((d) => ids.has(d.setup_id) && d.outcome === "changes_requested")
        .flatMap((d) => JSON.parse(d.reasons_json) as string[]),
      (c) => c,
    ),
  };
}

const FILTERS: Array<[string, InsightFilter]> = [
  ["no filter", { modelId: null, from: null, to: null }],
  ["one model", { modelId: "mdl-ridge-11", from: null, to: null }],
  ["a range of days", { modelId: null, from: "2026-11-20", to: "2026-11-28" }],
  ["whole months and the days around them", { modelId: null, from: "2026-09-17", to: "2026-11-28" }],
  ["one model from a day on", { modelId: "mdl-ridge-06", from: "2026-10-01", to: null }],
  ["up to a day", { modelId: null, from: null, to: "2026-11-15" }],
];

describe("getInsight", () => {
  for (const [label, filter] of FILTERS) {
    it(`returns the plain-JS reference's counts for the demo data with ${label}`, async () => {
      const got = await getInsight({ filter });
      if (!got.ok) throw new Error(got.error.message);
      const want = reference(filter);
      const d = got.data;
      expect(asCounts(d.payloadMassHistogram, (h) => `${Math.round(h.binStartKg / 0.05)}:${h.category}`)).toEqual(want.payloadMass);
      expect(d.payloadMassHistogram.every((h) => Math.abs(h.binEndKg - h.binStartKg - 0.05) < 1e-12)).toBe(true);
      expect(asCounts(d.setupPayloadMassHistogram, (h) => String(Math.round(h.binStartKg / 0.1)))).toEqual(want.setupPayloadMass);
      expect(asCounts(d.templateUsage, (t) => `${t.templateId}:${t.name}`)).toEqual(want.templates);
      expect(
        asCounts(d.railPosition, (r) => {
          const row = rows.find((x) => x.model_id === r.modelId)!;
          return `${r.modelId}:${Math.round(((r.binStartM - row.rail_start_x_m) / (row.rail_end_x_m - row.rail_start_x_m)) * 10)}`;
        }),
      ).toEqual(want.rail);
      expect(asCounts(d.freeLiftRatio, (h) => String(Math.round(h.binStart / 0.05)))).toEqual(want.freeLift);
      expect(asCounts(d.flagCounts, (f) => `${f.code}:${f.level}`)).toEqual(want.flags);
      expect(asCounts(d.setupsPerMonth, (m) => `${m.month}:${m.status}`)).toEqual(want.months);
      expect(asCounts(d.sendBackReasons, (r) => r.code)).toEqual(want.reasons);
      if (label === "no filter") {
        expect(d.setupPayloadMassHistogram.reduce((n, h) => n + h.count, 0)).toBe(rows.length);
        expect(Object.keys(want.flags).length).toBeGreaterThan(0);
      }
    });
  }
});
