import "server-only";
import { and, asc, desc, eq, gte, lte, or, sql, type SQL } from "drizzle-orm";
import { getDb } from "@/db";
import { DAY_MS, FREE_LIFT_BIN, PAYLOAD_BIN_KG, RAIL_BINS, SETUP_PAYLOAD_BIN_KG } from "@/db/insight-rollup-sql";
import { envelopeModels, insightRollups, payloadTemplates, setups, type INSIGHT_MEASURES } from "@/db/schema";
import type { FlagCode, FlagLevel, PayloadCategory, SetupStatus } from "@/lib/domain";

export { FREE_LIFT_BIN, PAYLOAD_BIN_KG, RAIL_BINS, SETUP_PAYLOAD_BIN_KG };

// Insight's aggregations: each one sums roll-up rows (db/insight-rollup-sql.ts keeps them in step
// with the setups) with GROUP BY over the roll-up table's key, never a pass over every setup.

export interface InsightFilter {
  modelId: string | null;
  /** Setups created on this UTC day (yyyy-mm-dd) or later … */
  from: string | null;
  /** … up to and including this one. */
  to: string | null;
}

type Unit = "year" | "month";
type Span = { span: Unit | "day"; first: number | null; last: number | null };

const dayNumber = (day: string) => Date.parse(`${day}T00:00:00Z`) / DAY_MS;
/** The first day of the year or month that holds `day`, or of the one `ahead` after it. */
function startOf(unit: Unit, day: number, ahead: 0 | 1): number {
  const date = new Date(day * DAY_MS);
  const year = date.getUTCFullYear() + (unit === "year" ? ahead : 0);
  const month = unit === "year" ? 0 : date.getUTCMonth() + ahead;
  return Date.UTC(year, month, 1) / DAY_MS;
}

/**
 * The fewest roll-up rows that count exactly the days first…last (inclusive day numbers; null: no
 * bound): the whole years in them, then the whole months of what is left, then its single days.
 */
export function spansOf(first: number | null, last: number | null, units: readonly Unit[] = ["year", "month"]): Span[] {
  const [unit, ...smaller] = units;
  if (!unit) return [{ span: "day", first, last }];
  const wholeFrom = first === null ? null : startOf(unit, first, 0) === first ? first : startOf(unit, first, 1);
  // The first day after the last whole year or month.
  const wholeUntil = last === null ? null : startOf(unit, last, 1) === last + 1 ? last + 1 : startOf(unit, last, 0);
  if (wholeFrom !== null && wholeUntil !== null && wholeFrom >= wholeUntil) return spansOf(first, last, smaller);
  return [
    ...(first !== null && wholeFrom !== null && first < wholeFrom ? spansOf(first, wholeFrom - 1, smaller) : []),
    { span: unit, first: wholeFrom, last: wholeUntil === null ? null : wholeUntil - 1 },
    ...(last !== null && wholeUntil !== null && wholeUntil <= last ? spansOf(wholeUntil, last, smaller) : []),
  ];
}

const r = insightRollups;

function where(measure: (typeof INSIGHT_MEASURES)[number], filter: InsightFilter, units?: readonly Unit[]): SQL {
  const spans = spansOf(filter.from ? dayNumber(filter.from) : null, filter.to ? dayNumber(filter.to) : null, units);
  // The measure and model inside every term, so each term is one range of the roll-up's key.
  return or(
    ...spans.map(({ span, first, last }) =>
      and(
        eq(r.measure, measure),
        eq(r.span, span),
        first !== null ? gte(r.firstDay, first) : undefined,
        last !== null ? lte(r.firstDay, last) : undefined,
        filter.modelId ? eq(r.modelId, filter.modelId) : undefined,
      ),
    ),
  ) as SQL;
}

const total = sql<number>`sum(${r.count})`.mapWith(Number);

export async function payloadMassHistogram(filter: InsightFilter) {
  const rows = await getDb()
    .select({ bin: r.bin, category: r.label, count: total })
    .from(r)
    .where(where("payload_mass", filter))
    .groupBy(r.bin, r.label)
    .orderBy(asc(r.bin), asc(r.label));
  return rows.map((row) => ({
    binStartKg: row.bin * PAYLOAD_BIN_KG,
    binEndKg: (row.bin + 1) * PAYLOAD_BIN_KG,
    category: row.category as PayloadCategory,
    count: row.count,
  }));
}

export async function setupPayloadMassHistogram(filter: InsightFilter) {
  const rows = await getDb()
    .select({ bin: r.bin, count: total })
    .from(r)
    .where(where("setup_payload_mass", filter))
    .groupBy(r.bin)
    .orderBy(asc(r.bin));
  return rows.map((row) => ({
    binStartKg: row.bin * SETUP_PAYLOAD_BIN_KG,
    binEndKg: (row.bin + 1) * SETUP_PAYLOAD_BIN_KG,
    count: row.count,
  }));
}

/** Templates by how many payloads came from them; the names are read now, so a renamed template counts under its new name. */
export async function templateUsage(filter: InsightFilter) {
  return getDb()
    .select({ templateId: payloadTemplates.id, name: payloadTemplates.name, count: total })
    .from(r)
    .innerJoin(payloadTemplates, eq(payloadTemplates.id, r.label))
    .where(where("template_usage", filter))
    .groupBy(payloadTemplates.id, payloadTemplates.name)
    .orderBy(desc(total), asc(payloadTemplates.name));
}

/** Where customers put the mount, as a tenth of each model's rail (a mount off the rail counts at its end). */
export async function railPosition(filter: InsightFilter) {
  const rows = await getDb()
    .select({ modelId: r.modelId, bin: r.bin, railStartXM: envelopeModels.railStartXM, railEndXM: envelopeModels.railEndXM, count: total })
    .from(r)
    .innerJoin(envelopeModels, eq(envelopeModels.id, r.modelId))
    .where(where("rail_position", filter))
    .groupBy(r.modelId, r.bin)
    .orderBy(asc(r.modelId), asc(r.bin));
  return rows.map((row) => {
    const widthM = (row.railEndXM - row.railStartXM) / RAIL_BINS;
    return {
      modelId: row.modelId,
      binStartM: row.railStartXM + row.bin * widthM,
      binEndM: row.railStartXM + (row.bin + 1) * widthM,
      count: row.count,
    };
  });
}

export async function freeLiftRatioHistogram(filter: InsightFilter) {
  const rows = await getDb()
    .select({ bin: r.bin, count: total })
    .from(r)
    .where(where("free_lift_ratio", filter))
    .groupBy(r.bin)
    .orderBy(asc(r.bin));
  return rows.map((row) => ({ binStart: row.bin * FREE_LIFT_BIN, binEnd: (row.bin + 1) * FREE_LIFT_BIN, count: row.count }));
}

/** How many setups raise each flag at each level. */
export async function flagCounts(filter: InsightFilter) {
  const rows = await getDb()
    .select({ code: r.label, level: r.level, count: total })
    .from(r)
    .where(where("flags", filter))
    .groupBy(r.label, r.level)
    .orderBy(asc(r.label), asc(r.level));
  return rows.map((row) => ({ code: row.code as FlagCode, level: row.level as FlagLevel, count: row.count }));
}

export async function setupsPerMonth(filter: InsightFilter) {
  const month = sql<string>`strftime('%Y-%m', ${r.firstDay} * 86400, 'unixepoch')`;
  const rows = await getDb()
    .select({ month, status: r.status, count: total })
    .from(r)
    .where(where("setups", filter, ["month"]))
    .groupBy(month, r.status)
    .orderBy(asc(month), asc(r.status));
  return rows.map((row) => ({ month: row.month, status: row.status as SetupStatus, count: row.count }));
}

/** Why reviewers sent setups back: each reason code of each decision to send back. */
export async function sendBackReasons(filter: InsightFilter) {
  const rows = await getDb()
    .select({ code: r.label, count: total })
    .from(r)
    .where(where("send_back_reasons", filter))
    .groupBy(r.label)
    .orderBy(desc(total), asc(r.label));
  return rows.map((row) => ({ code: row.code, count: row.count }));
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
