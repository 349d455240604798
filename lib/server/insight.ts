import "server-only";
import * as insightDb from "@/db/queries/insight";
import { ok, type Result } from "@/lib/errors";

export type Insight = {
  payloadMassHistogram: Awaited<ReturnType<typeof insightDb.payloadMassHistogram>>;
  setupPayloadMassHistogram: Awaited<ReturnType<typeof insightDb.setupPayloadMassHistogram>>;
  templateUsage: Awaited<ReturnType<typeof insightDb.templateUsage>>;
  railPosition: Awaited<ReturnType<typeof insightDb.railPosition>>;
  freeLiftRatio: Awaited<ReturnType<typeof insightDb.freeLiftRatioHistogram>>;
  flagCounts: Awaited<ReturnType<typeof insightDb.flagCounts>>;
  setupsPerMonth: Awaited<ReturnType<typeof insightDb.setupsPerMonth>>;
  sendBackReasons: Awaited<ReturnType<typeof insightDb.sendBackReasons>>;
};

/** What customers plan and fly, for the maker: every figure an SQL aggregation over the setups. */
export async function getInsight({ filter }: { filter: insightDb.InsightFilter }): Promise<Result<Insight>> {
  const [
    payloadMassHistogram,
    setupPayloadMassHistogram,
    templateUsage,
    railPosition,
    freeLiftRatio,
    flagCounts,
    setupsPerMonth,
    sendBackReasons,
  ] = await Promise.all([
    insightDb.payloadMassHistogram(filter),
    insightDb.setupPayloadMassHistogram(filter),
    insightDb.templateUsage(filter),
    insightDb.railPosition(filter),
    insightDb.freeLiftRatioHistogram(filter),
    insightDb.flagCounts(filter),
    insightDb.setupsPerMonth(filter),
    insightDb.sendBackReasons(filter),
  ]);
  return ok({
    payloadMassHistogram,
    setupPayloadMassHistogram,
    templateUsage,
    railPosition,
    freeLiftRatio,
    flagCounts,
    setupsPerMonth,
    sendBackReasons,
  });
}
