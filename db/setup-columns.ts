import type { SetupDraft } from "../lib/setups/setup-draft";
import type { BalanceResult } from "../lib/balance";
import type { setupFlags, setupPayloads, setupResults, setups } from "./schema";

// The one mapping between a setup's editable draft and its rows, used by the app's writes and by
// the seed alike, so demo rows are exactly what the app itself would store.

type SetupRow = typeof setups.$inferSelect;
type SetupPayloadRow = typeof setupPayloads.$inferSelect;

/** The setup columns a draft decides (everything but identity, status, version and the result). */
export function columnsFromDraft(draft: SetupDraft) {
  return {
    name: draft.name,
    modelId: draft.modelId,
    unitId: draft.unitId,
    mountId: draft.mountId,
    mountPositionXM: draft.mountPositionXM,
    siteName: draft.site.siteName,
    altitudeM: draft.site.altitudeM,
    temperatureC: draft.site.temperatureC,
    pressurePa: draft.site.pressurePa,
    windMS: draft.site.windMS,
    gustMS: draft.site.gustMS,
    windMeasuredAtM: draft.site.windMeasuredAtM,
    windShearExponent: draft.site.windShearExponent,
    relativeHumidity: draft.site.relativeHumidity,
    purity: draft.gas.purity,
    superheatK: draft.gas.superheatK,
    fillFraction: draft.gas.fillFraction,
    tetherMassPerMetreKg: draft.tether?.massPerMetreKg ?? null,
    tetherLengthOutM: draft.tether?.lengthOutM ?? null,
    tetherBreakingLoadN: draft.tether?.breakingLoadN ?? null,
    liftCheckFreeLiftKg: draft.liftCheck?.freeLiftKg ?? null,
    liftCheckTemperatureC: draft.liftCheck?.temperatureC ?? null,
    liftCheckWeighedWith: draft.liftCheck?.weighedWith ?? null,
    liftCheckSolveFor: draft.liftCheck?.solveFor ?? null,
    tetherDiameterM: draft.tether?.diameterM ?? null,
    targetHeightM: draft.targetHeightM,
  } satisfies Partial<SetupRow>;
}

/** The list columns copied from a stored evaluation, so lists never read the result JSON. */
export function summaryColumns(draft: SetupDraft, result: { freeLiftRatio: number }) {
  return {
    payloadMassKg: draft.payloads.reduce((sum, p) => sum + p.massKg, 0),
    freeLiftRatio: result.freeLiftRatio,
  } satisfies Partial<SetupRow>;
}

/** The payload rows of a draft, in mount order; ids come from the caller (random in the app, fixed in the seed). */
export function payloadRowsFromDraft(setupId: string, draft: SetupDraft, idFor: (index: number) => string) {
  return draft.payloads.map((p, i) => ({ ...p, id: idFor(i), setupId, sortOrder: i })) satisfies SetupPayloadRow[];
}

export function draftFromRows(row: SetupRow, payloadRows: readonly SetupPayloadRow[]): SetupDraft {
  const tether =
    row.tetherMassPerMetreKg !== null && row.tetherLengthOutM !== null && row.tetherBreakingLoadN !== null
      ? {
          massPerMetreKg: row.tetherMassPerMetreKg,
          lengthOutM: row.tetherLengthOutM,
          breakingLoadN: row.tetherBreakingLoadN,
          diameterM: row.tetherDiameterM,
        }
      : null;
  const liftCheck =
    row.liftCheckFreeLiftKg !== null &&
    row.liftCheckTemperatureC !== null &&
    row.liftCheckWeighedWith !== null &&
    row.liftCheckSolveFor !== null
      ? {
          freeLiftKg: row.liftCheckFreeLiftKg,
          temperatureC: row.liftCheckTemperatureC,
          weighedWith: row.liftCheckWeighedWith,
          solveFor: row.liftCheckSolveFor,
        }
      : null;
  return {
    name: row.name,
    modelId: row.modelId,
    unitId: row.unitId,
    mountId: row.mountId,
    mountPositionXM: row.mountPositionXM,
    site: {
      siteName: row.siteName,
      altitudeM: row.altitudeM,
      temperatureC: row.temperatureC,
      pressurePa: row.pressurePa,
      windMS: row.windMS,
      gustMS: row.gustMS,
      windMeasuredAtM: row.windMeasuredAtM,
      windShearExponent: row.windShearExponent,
      relativeHumidity: row.relativeHumidity,
    },
    gas: { purity: row.purity, superheatK: row.superheatK, fillFraction: row.fillFraction },
    tether,
    targetHeightM: row.targetHeightM,
    payloads: [...payloadRows]
      .sort((a, b) => a.sortOrder - b.sortOrder)
      .map((p) => ({
        templateId: p.templateId,
        name: p.name,
        category: p.category,
        massKg: p.massKg,
        shape: p.shape,
        lengthM: p.lengthM,
        widthM: p.widthM,
        heightM: p.heightM,
        attachment: p.attachment,
        adapterId: p.adapterId,
        dragAreaM2: p.dragAreaM2,
        offsetXM: p.offsetXM,
        offsetZM: p.offsetZM,
      })),
    // Only a setup with a check carries the key, so drafts from before the check read back unchanged.
    ...(liftCheck ? { liftCheck } : {}),
  };
}

/** The stored result of a setup and the distinct problems it raised (flags above `ok`), as rows. */
export function resultRows(setupId: string, result: BalanceResult) {
  const raised = result.flags.filter((f) => f.level !== "ok");
  const distinct = new Map(raised.map((f) => [`${f.code}:${f.level}`, { setupId, code: f.code, level: f.level }]));
  return {
    result: { setupId, resultJson: result } satisfies typeof setupResults.$inferInsert,
    flags: [...distinct.values()] satisfies (typeof setupFlags.$inferInsert)[],
  };
}
