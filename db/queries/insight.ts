import "server-only";
import { and, asc, count, eq, gte, lt, sql, type SQL } from "drizzle-orm";
import { getDb } from "@/db";
import { envelopeModels, payloadTemplates, setupFlags, setupPayloads, setups } from "@/db/schema";
import type { FlagCode, FlagLevel, PayloadCategory, SetupStatus } from "@/lib/domain";

// Insight's aggregations, each one GROUP BY in SQL over indexed columns of the setups (never a
// loop in JS over every row, never the stored result JSON).

export interface InsightFilter {
  modelId: string | null;
  /** Setups created from this instant (inclusive) … */
  from: Date | null;
  /** … to this one (exclusive). */
  to: Date | null;
}

export const PAYLOAD_BIN_KG = 0.05;
export const SETUP_PAYLOAD_BIN_KG = 0.1;
export const FREE_LIFT_BIN = 0.05;
export const RAIL_BINS = 10;

function where(filter: InsightFilter): SQL | undefined {
  const parts: SQL[] = [];
  if (filter.modelId) parts.push(eq(setups.modelId, filter.modelId));
  if (filter.from) parts.push(gte(setups.createdAt, filter.from));
  if (filter.to) parts.push(lt(setups.createdAt, filter.to));
  return parts.length ? and(...parts) : undefined;
}

/** The bin a value falls in: floor(value / width), as an integer (SQLite's math functions). */
const binOf = (value: SQL, width: number) => sql<number>`cast(floor(${value} / ${width}) as integer)`;

export async function payloadMassHistogram(filter: InsightFilter) {
  const bin = binOf(sql`${setupPayloads.massKg}`, PAYLOAD_BIN_KG);
  const rows = await getDb()
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

export async function setupPayloadMassHistogram(filter: InsightFilter) {
  const bin = binOf(sql`${setups.payloadMassKg}`, SETUP_PAYLOAD_BIN_KG);
  const rows = await getDb().select({ bin, count: count() }).from(setups).where(where(filter)).groupBy(bin).orderBy(asc(bin));
  return rows.map((r) => ({ binStartKg: r.bin * SETUP_PAYLOAD_BIN_KG, binEndKg: (r.bin + 1) * SETUP_PAYLOAD_BIN_KG, count: r.count }));
}

export async function templateUsage(filter: InsightFilter) {
  return getDb()
    .select({ templateId: payloadTemplates.id, name: payloadTemplates.name, count: count() })
    .from(setupPayloads)
    .innerJoin(setups, eq(setups.id, setupPayloads.setupId))
    .innerJoin(payloadTemplates, eq(payloadTemplates.id, setupPayloads.templateId))
    .where(where(filter))
    .groupBy(payloadTemplates.id, payloadTemplates.name)
    .orderBy(sql`count(*) desc`, asc(payloadTemplates.name));
}

/** Where customers put the mount, as a tenth of each model's rail (a mount off the rail counts at its end). */
export async function railPosition(filter: InsightFilter) {
  const bin = sql<number>`max(0, min(${sql.raw(String(RAIL_BINS - 1))}, cast(floor((${setups.mountPositionXM} - ${envelopeModels.railStartXM}) / (${envelopeModels.railEndXM} - ${envelopeModels.railStartXM}) * ${sql.raw(String(RAIL_BINS))}) as integer)))`;
  const rows = await getDb()
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

export async function freeLiftRatioHistogram(filter: InsightFilter) {
  const bin = binOf(sql`${setups.freeLiftRatio}`, FREE_LIFT_BIN);
  const rows = await getDb()
    .select({ bin, count: count() })
    .from(setups)
    .where(and(where(filter), sql`${setups.freeLiftRatio} is not null`))
    .groupBy(bin)
    .orderBy(asc(bin));
  return rows.map((r) => ({ binStart: r.bin * FREE_LIFT_BIN, binEnd: (r.bin + 1) * FREE_LIFT_BIN, count: r.count }));
}

/** How many setups raise each flag at each level. */
export async function flagCounts(filter: InsightFilter) {
  const rows = await getDb()
    .select({ code: setupFlags.code, level: setupFlags.level, count: count() })
    .from(setupFlags)
    .innerJoin(setups, eq(setups.id, setupFlags.setupId))
    .where(where(filter))
    .groupBy(setupFlags.code, setupFlags.level)
    .orderBy(asc(setupFlags.code), asc(setupFlags.level));
  return rows.map((r) => ({ code: r.code as FlagCode, level: r.level as FlagLevel, count: r.count }));
}

export async function setupsPerMonth(filter: InsightFilter) {
  const month = sql<string>`strftime('%Y-%m', ${setups.createdAt} / 1000, 'unixepoch')`;
  const rows = await getDb()
    .select({ month, status: setups.status, count: count() })
    .from(setups)
    .where(where(filter))
    .groupBy(month, setups.status)
    .orderBy(asc(month), asc(setups.status));
  return rows.map((r) => ({ month: r.month, status: r.status as SetupStatus, count: r.count }));
}

/** Why reviewers sent setups back: each reason code of each decision to send back. */
export async function sendBackReasons(filter: InsightFilter) {
  const rows = await getDb().all<{ code: string; count: number }>(sql`
    select r.value as code, count(*) as count
    from decisions d join setups on setups.id = d.setup_id, json_each(d.reasons_json) r
    where d.outcome = 'changes_requested' ${filter.modelId ? sql`and setups.model_id = ${filter.modelId}` : sql``}
      ${filter.from ? sql`and setups.created_at >= ${filter.from.getTime()}` : sql``}
      ${filter.to ? sql`and setups.created_at < ${filter.to.getTime()}` : sql``}
    group by r.value order by count(*) desc, r.value`);
  return rows.map((r) => ({ code: r.code, count: Number(r.count) }));
}

/** Setups for the CSV export, in id order after `afterId` (keyset pages: no OFFSET, no result JSON). */
export async function pageOfSetupsForExport({ afterId, limit }: { afterId: string; limit: number }) {
  return getDb()
    .select({
      id: setups.id,
      name: setups.name,
      status: setups.status,
      ownerId: setups.ownerId,
      modelId: setups.modelId,
      unitId: setups.unitId,
      mountId: setups.mountId,
      mountPositionXM: setups.mountPositionXM,
      payloadMassKg: setups.payloadMassKg,
      freeLiftRatio: setups.freeLiftRatio,
      worstFlag: setups.worstFlag,
      altitudeM: setups.altitudeM,
      temperatureC: setups.temperatureC,
      windMS: setups.windMS,
      gustMS: setups.gustMS,
      purity: setups.purity,
      fillFraction: setups.fillFraction,
      tetherLengthOutM: setups.tetherLengthOutM,
      createdAt: setups.createdAt,
      updatedAt: setups.updatedAt,
      submittedAt: setups.submittedAt,
    })
    .from(setups)
    .where(sql`${setups.id} > ${afterId}`)
    .orderBy(asc(setups.id))
    .limit(limit);
}
