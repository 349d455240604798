import { and, asc, count, eq, gte, lt, sql, type SQL } from "drizzle-orm";
import type { Database } from "@/db/index";
import { FREE_LIFT_BIN, PAYLOAD_BIN_KG, RAIL_BINS, SETUP_PAYLOAD_BIN_KG } from "@/db/insight-rollup-sql";
import type { InsightFilter } from "@/db/queries/insight";
import { envelopeModels, payloadTemplates, setupFlags, setupPayloads, setups } from "@/db/schema";
import type { FlagCode, FlagLevel, PayloadCategory, SetupStatus } from "@/lib/domain";

// The reference for Insight's roll-ups: each figure as a fresh GROUP BY over the base tables (the
// queries Insight ran before it had roll-ups), with the same output shape as db/queries/insight.ts.

const afterDay = (day: string) => new Date(Date.parse(`${day}T00:00:00Z`) + 86_400_000);

function where(filter: InsightFilter): SQL | undefined {
  const parts: SQL[] = [];
  if (filter.modelId) parts.push(eq(setups.modelId, filter.modelId));
  if (filter.from) parts.push(gte(setups.createdAt, new Date(`${filter.from}T00:00:00Z`)));
  if (filter.to) parts.push(lt(setups.createdAt, afterDay(filter.to)));
  return parts.length ? and(...parts) : undefined;
}

/** The bin a value falls in: floor(value / width), as an integer (SQLite's math functions). */
const binOf = (value: SQL, width: number) => sql<number>`cast(floor(${value} / ${width}) as integer)`;

async function payloadMassHistogram(db: Database, filter: InsightFilter) {
  const bin = binOf(sql`${setupPayloads.massKg}`, PAYLOAD_BIN_KG);
  const rows = await db
    .select({ bin, category: setupPayloads.category, count: count() })
    .from(setupPayloads)
    .innerJoin(setups, eq(setups.id, setupPayloads.setupId))
    .where(where(filter))
    .groupBy(bin, setupPayloads.category)
    .orderBy(asc(bin), asc(setupPayloads.category));
  return rows.map((r) => ({
    binStartKg: r.bin * PAYLOAD_BIN_KG,
    binEndKg: (r.bin + 1) * PAYLOAD_BIN_KG,
    category: r.category as PayloadCategory,
    count: r.count,
  }));
}

async function setupPayloadMassHistogram(db: Database, filter: InsightFilter) {
  const bin = binOf(sql`${setups.payloadMassKg}`, SETUP_PAYLOAD_BIN_KG);
  const rows = await db.select({ bin, count: count() }).from(setups).where(where(filter)).groupBy(bin).orderBy(asc(bin));
  return rows.map((r) => ({ binStartKg: r.bin * SETUP_PAYLOAD_BIN_KG, binEndKg: (r.bin + 1) * SETUP_PAYLOAD_BIN_KG, count: r.count }));
}

async function templateUsage(db: Database, filter: InsightFilter) {
  return db
    .select({ templateId: payloadTemplates.id, name: payloadTemplates.name, count: count() })
    .from(setupPayloads)
    .innerJoin(setups, eq(setups.id, setupPayloads.setupId))
    .innerJoin(payloadTemplates, eq(payloadTemplates.id, setupPayloads.templateId))
    .where(where(filter))
    .groupBy(payloadTemplates.id, payloadTemplates.name)
    .orderBy(sql`count(*) desc`, asc(payloadTemplates.name));
}

/** Where customers put the mount, as a tenth of each model's rail (a mount off the rail counts at its end). */
async function railPosition(db: Database, filter: InsightFilter) {
  const bin = sql<number>`max(0, min(${sql.raw(String(RAIL_BINS - 1))}, cast(floor((${setups.mountPositionXM} - ${envelopeModels.railStartXM}) / (${envelopeModels.railEndXM} - ${envelopeModels.railStartXM}) * ${sql.raw(String(RAIL_BINS))}) as integer)))`;
  const rows = await db
    .select({ modelId: setups.modelId, bin, railStartXM: envelopeModels.railStartXM, railEndXM: envelopeModels.railEndXM, count: count() })
    .from(setups)
    .innerJoin(envelopeModels, eq(envelopeModels.id, setups.modelId))
    .where(where(filter))
    .groupBy(setups.modelId, bin)
    .orderBy(asc(setups.modelId), asc(bin));
  return rows.map((r) => {
    const widthM = (r.railEndXM - r.railStartXM) / RAIL_BINS;
    return { modelId: r.modelId, binStartM: r.railStartXM + r.bin * widthM, binEndM: r.railStartXM + (r.bin + 1) * widthM, count: r.count };
  });
}

async function freeLiftRatioHistogram(db: Database, filter: InsightFilter) {
  const bin = binOf(sql`${setups.freeLiftRatio}`, FREE_LIFT_BIN);
  const rows = await db
    .select({ bin, count: count() })
    .from(setups)
    .where(and(where(filter), sql`${setups.freeLiftRatio} is not null`))
    .groupBy(bin)
    .orderBy(asc(bin));
  return rows.map((r) => ({ binStart: r.bin * FREE_LIFT_BIN, binEnd: (r.bin + 1) * FREE_LIFT_BIN, count: r.count }));
}

/** How many setups raise each flag at each level. */
async function flagCounts(db: Database, filter: InsightFilter) {
  const rows = await db
    .select({ code: setupFlags.code, level: setupFlags.level, count: count() })
    .from(setupFlags)
    .innerJoin(setups, eq(setups.id, setupFlags.setupId))
    .where(where(filter))
    .groupBy(setupFlags.code, setupFlags.level)
    .orderBy(asc(setupFlags.code), asc(setupFlags.level));
  return rows.map((r) => ({ code: r.code as FlagCode, level: r.level as FlagLevel, count: r.count }));
}

async function setupsPerMonth(db: Database, filter: InsightFilter) {
  const month = sql<string>`strftime('%Y-%m', ${setups.createdAt} / 1000, 'unixepoch')`;
  const rows = await db
    .select({ month, status: setups.status, count: count() })
    .from(setups)
    .where(where(filter))
    .groupBy(month, setups.status)
    .orderBy(asc(month), asc(setups.status));
  return rows.map((r) => ({ month: r.month, status: r.status as SetupStatus, count: r.count }));
}

/** Why reviewers sent setups back: each reason code of each decision to send back. */
async function sendBackReasons(db: Database, filter: InsightFilter) {
  const rows = await db.all<{ code: string; count: number }>(sql`
    select r.value as code, count(*) as count
    from decisions d join setups on setups.id = d.setup_id, json_each(d.reasons_json) r
    where d.outcome = 'changes_requested' ${filter.modelId ? sql`and setups.model_id = ${filter.modelId}` : sql``}
      ${filter.from ? sql`and setups.created_at >= ${Date.parse(`${filter.from}T00:00:00Z`)}` : sql``}
      ${filter.to ? sql`and setups.created_at < ${afterDay(filter.to).getTime()}` : sql``}
    group by r.value order by count(*) desc, r.value`);
  return rows.map((r) => ({ code: r.code, count: Number(r.count) }));
}

/** Every figure of getInsight, from the base tables. */
export async function insightFromBaseTables(db: Database, filter: InsightFilter) {
  return {
    payloadMassHistogram: await payloadMassHistogram(db, filter),
    setupPayloadMassHistogram: await setupPayloadMassHistogram(db, filter),
    templateUsage: await templateUsage(db, filter),
    railPosition: await railPosition(db, filter),
    freeLiftRatio: await freeLiftRatioHistogram(db, filter),
    flagCounts: await flagCounts(db, filter),
    setupsPerMonth: await setupsPerMonth(db, filter),
    sendBackReasons: await sendBackReasons(db, filter),
  };
}
