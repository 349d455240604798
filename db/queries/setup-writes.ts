import "server-only";
import { and, eq, inArray } from "drizzle-orm";
import { randomUUID } from "node:crypto";
import { getDb } from "@/db";
import { auditLog, setupPayloads, setups } from "@/db/schema";
import type { FlagLevel, SetupStatus } from "@/lib/domain";
import type { SetupDraft } from "@/lib/setups/setup-draft";

type Tx = Parameters<Parameters<ReturnType<typeof getDb>["transaction"]>[0]>[0];

function columnsFromDraft(draft: SetupDraft) {
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
    purity: draft.gas.purity,
    superheatK: draft.gas.superheatK,
    fillFraction: draft.gas.fillFraction,
    tetherMassPerMetreKg: draft.tether?.massPerMetreKg ?? null,
    tetherLengthOutM: draft.tether?.lengthOutM ?? null,
    tetherBreakingLoadN: draft.tether?.breakingLoadN ?? null,
  };
}

async function replacePayloads(tx: Tx, setupId: string, draft: SetupDraft): Promise<void> {
  await tx.delete(setupPayloads).where(eq(setupPayloads.setupId, setupId));
  if (draft.payloads.length === 0) return;
  await tx.insert(setupPayloads).values(draft.payloads.map((p, i) => ({ ...p, id: randomUUID(), setupId, sortOrder: i })));
}

async function audit(tx: Tx, actorId: string, action: string, setupId: string, detail: Record<string, unknown> = {}): Promise<void> {
  await tx.insert(auditLog).values({ id: randomUUID(), actorId, action, entityType: "setup", entityId: setupId, detailJson: detail });
}

/** The owner's view of a setup's version and status, read inside the writing transaction. */
async function readOwnedVersion(tx: Tx, id: string, ownerId: string): Promise<{ version: number; status: SetupStatus } | null> {
  const [row] = await tx
    .select({ version: setups.version, status: setups.status })
    .from(setups)
    .where(and(eq(setups.id, id), eq(setups.ownerId, ownerId)));
  return row ?? null;
}

export interface Evaluated {
  result: unknown;
  worstFlag: FlagLevel;
}

export async function createSetup({ ownerId, draft, evaluated }: { ownerId: string; draft: SetupDraft; evaluated: Evaluated }): Promise<string> {
  const id = randomUUID();
  await getDb().transaction(async (tx) => {
    await tx.insert(setups).values({ id, ownerId, ...columnsFromDraft(draft), status: "draft", version: 1, resultJson: evaluated.result, worstFlag: evaluated.worstFlag });
    await replacePayloads(tx, id, draft);
    await audit(tx, ownerId, "setup.create", id);
  });
  return id;
}

export type SaveOutcome = { kind: "saved"; version: number; status: SetupStatus } | { kind: "not_found" } | { kind: "conflict"; currentVersion: number };

/**
 * Writes a setup only if nobody saved since `expectedVersion` was read (optimistic concurrency).
 * A change to a submitted or approved setup takes it back to draft: the review was of other numbers.
 */
export async function saveSetup({
  id,
  ownerId,
  expectedVersion,
  draft,
  evaluated,
}: {
  id: string;
  ownerId: string;
  expectedVersion: number;
  draft: SetupDraft;
  evaluated: Evaluated;
}): Promise<SaveOutcome> {
  return getDb().transaction(async (tx) => {
    const current = await readOwnedVersion(tx, id, ownerId);
    if (!current) return { kind: "not_found" };
    if (current.version !== expectedVersion) return { kind: "conflict", currentVersion: current.version };
    const status: SetupStatus = current.status === "changes_requested" ? "changes_requested" : "draft";
    const updated = await tx
      .update(setups)
      .set({
        ...columnsFromDraft(draft),
        status,
        version: expectedVersion + 1,
        resultJson: evaluated.result,
        worstFlag: evaluated.worstFlag,
        cautionsAcknowledged: false,
        updatedAt: new Date(),
      })
      .where(and(eq(setups.id, id), eq(setups.version, expectedVersion)))
      .returning({ version: setups.version });
    if (updated.length === 0) return { kind: "conflict", currentVersion: expectedVersion + 1 };
    await replacePayloads(tx, id, draft);
    await audit(tx, ownerId, "setup.save", id, { version: expectedVersion + 1 });
    return { kind: "saved", version: expectedVersion + 1, status };
  });
}

export type SubmitOutcome = { kind: "submitted"; version: number } | { kind: "not_found" } | { kind: "conflict"; currentVersion: number } | { kind: "wrong_status"; status: SetupStatus };

export async function markSetupSubmitted({
  id,
  ownerId,
  expectedVersion,
  evaluated,
}: {
  id: string;
  ownerId: string;
  expectedVersion: number;
  evaluated: Evaluated;
}): Promise<SubmitOutcome> {
  return getDb().transaction(async (tx) => {
    const current = await readOwnedVersion(tx, id, ownerId);
    if (!current) return { kind: "not_found" };
    if (current.version !== expectedVersion) return { kind: "conflict", currentVersion: current.version };
    if (current.status !== "draft" && current.status !== "changes_requested") return { kind: "wrong_status", status: current.status };
    await tx
      .update(setups)
      .set({
        status: "submitted",
        version: expectedVersion + 1,
        resultJson: evaluated.result,
        worstFlag: evaluated.worstFlag,
        cautionsAcknowledged: evaluated.worstFlag === "caution",
        submittedAt: new Date(),
        updatedAt: new Date(),
      })
      .where(eq(setups.id, id));
    await audit(tx, ownerId, "setup.submit", id, { version: expectedVersion + 1, worstFlag: evaluated.worstFlag });
    return { kind: "submitted", version: expectedVersion + 1 };
  });
}

export async function deleteSetups({ ids, ownerId }: { ids: string[]; ownerId: string }): Promise<number> {
  return getDb().transaction(async (tx) => {
    const deleted = await tx
      .delete(setups)
      .where(and(inArray(setups.id, ids), eq(setups.ownerId, ownerId)))
      .returning({ id: setups.id });
    for (const row of deleted) await audit(tx, ownerId, "setup.delete", row.id);
    return deleted.length;
  });
}
