import { eq, inArray } from "drizzle-orm";
import { expect } from "vitest";
import type { openDatabase } from "../../db/index";
import { adapters, envelopeModels, envelopeUnits, mounts, unitLiftTests } from "../../db/schema";
import { latestLiftTest, unitCalibrationFactor } from "../../lib/setups/calibration";
import { evaluateBalance, worstLevel, type FlagLevel } from "../../lib/balance";
import { toBalanceInput, type SetupCatalogue } from "../../lib/setups/balance-input";
import type { SetupDraft } from "../../lib/setups/setup-draft";
import type { ApiClient } from "./http";

type Db = ReturnType<typeof openDatabase>["db"];

/** The catalogue rows a draft names, read straight from the database (not through the app's queries). */
export async function catalogueFor(db: Db, draft: SetupDraft): Promise<SetupCatalogue> {
  const [model] = await db.select().from(envelopeModels).where(eq(envelopeModels.id, draft.modelId));
  const [mount] = await db.select().from(mounts).where(eq(mounts.id, draft.mountId));
  const [unitRow] = draft.unitId ? await db.select().from(envelopeUnits).where(eq(envelopeUnits.id, draft.unitId)) : [];
  const tests = unitRow ? await db.select().from(unitLiftTests).where(eq(unitLiftTests.unitId, unitRow.id)) : [];
  const unit =
    unitRow && model ? { ...unitRow, calibrationFactor: unitCalibrationFactor(model.gasVolumeM3, latestLiftTest(tests)) } : undefined;
  const adapterIds = draft.payloads.map((p) => p.adapterId).filter((id): id is string => id !== null);
  const adapterRows = adapterIds.length ? await db.select().from(adapters).where(inArray(adapters.id, adapterIds)) : [];
  expect(model, `model ${draft.modelId}`).toBeDefined();
  expect(mount, `mount ${draft.mountId}`).toBeDefined();
  return { model, unit: unit ?? null, mount, adaptersById: Object.fromEntries(adapterRows.map((a) => [a.id, a])) };
}

/** The same draft with the mount moved along the rail to the first place where the worst flag is `wanted`. */
export async function draftWithWorstFlag(db: Db, draft: SetupDraft, wanted: FlagLevel): Promise<SetupDraft> {
  const catalogue = await catalogueFor(db, draft);
  const { railStartXM, railEndXM } = catalogue.model;
  for (let step = 0; step <= 40; step += 1) {
    const candidate: SetupDraft = { ...draft, mountPositionXM: railStartXM + (step / 40) * (railEndXM - railStartXM) };
    if (worstLevel(evaluateBalance(toBalanceInput(candidate, catalogue)).flags) === wanted) return candidate;
  }
  throw new Error(`no rail position gives a worst flag of ${wanted}`);
}

export interface StoredSetupBody {
  id: string;
  version: number;
  status: string;
  draft: SetupDraft;
}

export async function readSetupOver(client: ApiClient, id: string): Promise<StoredSetupBody> {
  const response = await client.get(`/api/setups/${id}`);
  expect(response.status, `GET ${id}`).toBe(200);
  return (await response.json()) as StoredSetupBody;
}

/** A new all-`ok` setup of the client's, submitted for review; returns it as stored after the submit. */
export async function submittedSetup(db: Db, client: ApiClient, { from, name }: { from: string; name: string }): Promise<StoredSetupBody> {
  const source = await readSetupOver(client, from);
  const draft = await draftWithWorstFlag(db, { ...source.draft, name }, "ok");
  const created = await client.request("POST", "/api/setups", { draft });
  expect(created.status).toBe(201);
  const { id, version } = (await created.json()) as { id: string; version: number };
  const submit = await client.request("POST", `/api/setups/${id}/submit`, { version, acknowledgeCautions: false });
  expect(submit.status, JSON.stringify(await submit.clone().json())).toBe(200);
  return readSetupOver(client, id);
}
