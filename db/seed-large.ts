import { hashPassword } from "better-auth/crypto";
import { sql } from "drizzle-orm";
import { evaluateBalance, worstLevel } from "../lib/balance";
import { toBalanceInput, type SetupCatalogue } from "../lib/setups/balance-input";
import type { SetupDraft } from "../lib/setups/setup-draft";
import { DEFAULT_WIND_MEASUREMENT, type SetupStatus } from "../lib/domain";
import { loadThenRebuildDerivedTables } from "./derived-tables";
import type { Database } from "./index";
import * as t from "./schema";
import { demoModelRow } from "./seed";
import { DEMO_ADAPTERS, DEMO_MODELS, DEMO_MOUNTS, DEMO_PASSWORD, DEMO_TEMPLATES } from "./seed-data";
import { columnsFromDraft, payloadRowsFromDraft, resultRows, summaryColumns } from "./setup-columns";

// A database at scale for benchmarks: many invented customers and their setups in every status,
// each with the server's own evaluation stored, written through the app's own column mapping.
// Deterministic (a seeded generator), so two runs build the same rows.

const FIRST = [
  "Alder",
  "Brisk",
  "Corrin",
  "Dace",
  "Elm",
  "Fenn",
  "Garth",
  "Hale",
  "Ivo",
  "Juno",
  "Kell",
  "Lark",
  "Mabry",
  "Nell",
  "Orla",
  "Pike",
  "Quill",
  "Rook",
  "Sable",
  "Tamsin",
];
const LAST = [
  "Ashdown",
  "Brackley",
  "Cairnholt",
  "Dunmere",
  "Eskwith",
  "Farrowby",
  "Gillan",
  "Hollins",
  "Ingleby",
  "Jessop",
  "Kettering",
  "Lowther",
  "Marrick",
  "Norland",
  "Ormsby",
  "Pellow",
  "Quarrie",
  "Rathbone",
  "Sowerby",
  "Thwaite",
];
const PLACES = ["north field", "ridge top", "river meadow", "harbour wall", "quarry edge", "old airstrip", "dune slack", "moor gate"];
const PLANS = ["survey", "relay", "profile", "test lift", "night marker", "beacon", "sampling", "mapping"];
const STATUSES: readonly [SetupStatus, number][] = [
  ["draft", 0.4],
  ["submitted", 0.25],
  ["changes_requested", 0.1],
  ["approved", 0.25],
];
const DAY_MS = 86_400_000;

/** mulberry32: a small, well-mixed 32-bit generator (public-domain algorithm), seeded for repeatable data. */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let x = Math.imul(a ^ (a >>> 15), 1 | a);
    x = (x + Math.imul(x ^ (x >>> 7), 61 | x)) ^ x;
    return ((x ^ (x >>> 14)) >>> 0) / 4294967296;
  };
}

export interface LargeSeedOptions {
  setups: number;
  customers: number;
  /** Called after every batch with the number written so far. */
  onProgress?: (written: number) => void;
}

/** The invented customer whose account can sign in: `large-0@customers.trimrail.test`. */
export const LARGE_SIGN_IN_EMAIL = "large-0@customers.trimrail.test";

export async function seedLarge(
  db: Database,
  { setups, customers, onProgress }: LargeSeedOptions,
): Promise<{ customers: number; setups: number }> {
  const rand = random(20261202);
  const pick = <T>(items: readonly T[]): T => items[Math.floor(rand() * items.length)];
  const models = DEMO_MODELS.map(demoModelRow);
  const adaptersById = Object.fromEntries(DEMO_ADAPTERS.map((a) => [a.id, a]));
  const epoch = Date.UTC(2026, 10, 30);

  const customerIds: string[] = [];
  for (let start = 0; start < customers; start += 500) {
    const batch = Array.from({ length: Math.min(500, customers - start) }, (_, i) => {
      const n = start + i;
      const id = `usr-large-${String(n).padStart(5, "0")}`;
      customerIds.push(id);
      return {
        id,
        name: `${FIRST[n % FIRST.length]} ${LAST[Math.floor(n / FIRST.length) % LAST.length]} ${Math.floor(n / 400) + 1}`,
        email: `large-${n}@customers.trimrail.test`,
        emailVerified: true,
        role: "customer" as const,
      };
    });
    await db.insert(t.user).values(batch).onConflictDoNothing();
  }

  // Written with the derived triggers off and counted once at the end (db/derived-tables.ts).
  await loadThenRebuildDerivedTables(db, () => writeSetups());
  async function writeSetups() {
    for (let start = 0; start < setups; start += 1000) {
      const size = Math.min(1000, setups - start);
      const setupRows: (typeof t.setups.$inferInsert)[] = [];
      const payloadRows: (typeof t.setupPayloads.$inferInsert)[] = [];
      const storedResults: (typeof t.setupResults.$inferInsert)[] = [];
      const flagRows: (typeof t.setupFlags.$inferInsert)[] = [];
      for (let i = 0; i < size; i += 1) {
        const n = start + i;
        const model = pick(models);
        const mount = pick(DEMO_MOUNTS);
        const templates = Array.from({ length: Math.floor(rand() * 3.2) }, () => pick(DEMO_TEMPLATES));
        const draft: SetupDraft = {
          name: `${pick(PLANS)} at the ${pick(PLACES)} ${n}`,
          modelId: model.id,
          unitId: null,
          mountId: mount.id,
          mountPositionXM: model.railStartXM + rand() * (model.railEndXM - model.railStartXM),
          site: {
            siteName: pick(PLACES),
            altitudeM: Math.round(rand() * 1500),
            temperatureC: Math.round(rand() * 30 - 5),
            pressurePa: null,
            windMS: Math.round(rand() * 90) / 10,
            gustMS: Math.round(rand() * 140) / 10,
            ...DEFAULT_WIND_MEASUREMENT,
            relativeHumidity: null,
          },
          gas: { purity: 0.9 + Math.round(rand() * 10) / 100, superheatK: 0, fillFraction: 1 },
          tether: { massPerMetreKg: 0.0012, lengthOutM: 20 + Math.round(rand() * 130), breakingLoadN: 900, diameterM: null },
          targetHeightM: null,
          payloads: templates.map((tpl) => ({
            templateId: tpl.id,
            name: tpl.name,
            category: tpl.category,
            massKg: tpl.massKg,
            shape: tpl.shape,
            lengthM: tpl.lengthM,
            widthM: tpl.widthM,
            heightM: tpl.heightM,
            attachment: tpl.attachment,
            adapterId:
              tpl.attachment === mount.thread
                ? null
                : (DEMO_ADAPTERS.find((a) => a.fromThread === tpl.attachment && a.toThread === mount.thread)?.id ?? null),
            dragAreaM2: tpl.dragAreaM2,
            offsetXM: tpl.offsetXM,
            offsetZM: tpl.offsetZM,
          })),
        };
        const catalogue: SetupCatalogue = { model: model as SetupCatalogue["model"], unit: null, mount, adaptersById };
        const result = evaluateBalance(toBalanceInput(draft, catalogue));
        let roll = rand();
        const status = STATUSES.find(([, share]) => (roll -= share) < 0)?.[0] ?? "draft";
        const updatedAt = new Date(epoch - Math.floor(rand() * 730 * DAY_MS));
        const id = `set-large-${String(n).padStart(6, "0")}`;
        setupRows.push({
          id,
          ownerId: customerIds[Math.floor(rand() * customerIds.length)],
          ...columnsFromDraft(draft),
          ...summaryColumns(draft, result),
          status,
          version: 1 + Math.floor(rand() * 4),
          worstFlag: worstLevel(result.flags),
          cautionsAcknowledged: status !== "draft",
          submittedAt: status === "draft" ? null : new Date(updatedAt.getTime() - DAY_MS),
          createdAt: new Date(updatedAt.getTime() - 2 * DAY_MS),
          updatedAt,
        });
        payloadRows.push(...payloadRowsFromDraft(id, draft, (k) => `${id}-p${k}`));
        const stored = resultRows(id, result);
        storedResults.push(stored.result);
        flagRows.push(...stored.flags);
      }
      await db.transaction(async (tx) => {
        // A statement binds at most 32,766 values (SQLite's default limit): a setup row has nearly 40.
        for (let k = 0; k < setupRows.length; k += 500)
          await tx
            .insert(t.setups)
            .values(setupRows.slice(k, k + 500))
            .onConflictDoNothing();
        for (let k = 0; k < payloadRows.length; k += 1000)
          await tx
            .insert(t.setupPayloads)
            .values(payloadRows.slice(k, k + 1000))
            .onConflictDoNothing();
        await tx.insert(t.setupResults).values(storedResults).onConflictDoNothing();
        for (let k = 0; k < flagRows.length; k += 2000)
          await tx
            .insert(t.setupFlags)
            .values(flagRows.slice(k, k + 2000))
            .onConflictDoNothing();
      });
      onProgress?.(start + size);
    }
  }
  // One of them can sign in (the demo password), so the benchmarks can open a long Setups list.
  const first = customerIds[0];
  if (first) {
    await db
      .insert(t.account)
      .values({
        id: `acc-${first}`,
        accountId: first,
        providerId: "credential",
        userId: first,
        password: await hashPassword(DEMO_PASSWORD),
      })
      .onConflictDoNothing();
  }
  await db.run(sql`analyze`);
  return { customers, setups };
}
