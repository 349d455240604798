import "server-only";
import { and, count, desc, eq } from "drizzle-orm";
import { randomUUID } from "node:crypto";
import { getDb, type Database } from "@/db";
import { envelopeModels, setupFlags, setupPayloads, setupResults, setups, user, type SetupRow } from "@/db/schema";
import { columnsFromDraft, draftFromRows, payloadRowsFromDraft, resultRows, summaryColumns } from "@/db/setup-columns";
import type { BalanceResult } from "@/lib/balance";
import { nextStatus, type FlagLevel, type Role, type SetupStatus } from "@/lib/domain";
import { deleteAttachmentRowsOfSetup } from "./attachments";
import { recordAudit } from "./audit";
import { enqueueMail, type OutgoingMail } from "./mail";
import type { SetupDraft } from "@/lib/setups/setup-draft";

export type Tx = Parameters<Parameters<Database["transaction"]>[0]>[0];

// ---------------------------------------------------------------- reads

export interface SetupListItem {
  id: string;
  name: string;
  status: SetupStatus;
  worstFlag: FlagLevel | null;
  modelName: string;
  ownerName: string;
  updatedAt: Date;
  submittedAt: Date | null;
}

/** A setup list row: the setup with its model's and its owner's names (never the stored result). */
function selectSetupList() {
  return getDb()
    .select({
      id: setups.id,
      name: setups.name,
      status: setups.status,
      worstFlag: setups.worstFlag,
      modelName: envelopeModels.name,
      ownerName: user.name,
      updatedAt: setups.updatedAt,
      submittedAt: setups.submittedAt,
    })
    .from(setups)
    .innerJoin(envelopeModels, eq(setups.modelId, envelopeModels.id))
    .innerJoin(user, eq(setups.ownerId, user.id));
}

/** One page of a person's setups, most recently changed first, and how many they have in all. */
export async function listSetupsForOwner({
  ownerId,
  page = 1,
  pageSize = 25,
}: {
  ownerId: string;
  page?: number;
  pageSize?: number;
}): Promise<{ rows: SetupListItem[]; total: number }> {
  const [rows, [{ total }]] = await Promise.all([
    selectSetupList()
      .where(eq(setups.ownerId, ownerId))
      .orderBy(desc(setups.updatedAt), desc(setups.id))
      .limit(pageSize)
      .offset((page - 1) * pageSize),
    getDb().select({ total: count() }).from(setups).where(eq(setups.ownerId, ownerId)),
  ]);
  return { rows, total };
}

export interface StoredSetup {
  row: SetupRow;
  draft: SetupDraft;
  /** The server's stored evaluation; null only for a setup written before results were kept. */
  result: BalanceResult | null;
}

/** A setup with its payloads, or null: only its owner's when `ownerId` is given, any when it is null (staff). */
export async function getSetupById({ id, ownerId }: { id: string; ownerId: string | null }): Promise<StoredSetup | null> {
  const db = getDb();
  const where = ownerId === null ? eq(setups.id, id) : and(eq(setups.id, id), eq(setups.ownerId, ownerId));
  const [found] = await db
    .select({ row: setups, result: setupResults.resultJson })
    .from(setups)
    .leftJoin(setupResults, eq(setupResults.setupId, setups.id))
    .where(where);
  if (!found) return null;
  const payloadRows = await db.select().from(setupPayloads).where(eq(setupPayloads.setupId, id));
  return { row: found.row, draft: draftFromRows(found.row, payloadRows), result: found.result ?? null };
}

export async function ownsSetup({ id, ownerId }: { id: string; ownerId: string }): Promise<boolean> {
  const [row] = await getDb()
    .select({ id: setups.id })
    .from(setups)
    .where(and(eq(setups.id, id), eq(setups.ownerId, ownerId)));
  return row !== undefined;
}

// ---------------------------------------------------------------- writes

export interface Evaluated {
  result: BalanceResult;
  worstFlag: FlagLevel;
}

/** The stored result and its flag rows, replaced together. */
async function replaceResult(tx: Tx, setupId: string, result: BalanceResult): Promise<void> {
  const rows = resultRows(setupId, result);
  await tx
    .insert(setupResults)
    .values(rows.result)
    .onConflictDoUpdate({ target: setupResults.setupId, set: { resultJson: rows.result.resultJson } });
  await tx.delete(setupFlags).where(eq(setupFlags.setupId, setupId));
  if (rows.flags.length) await tx.insert(setupFlags).values(rows.flags);
}

async function replacePayloads(tx: Tx, setupId: string, draft: SetupDraft): Promise<void> {
  await tx.delete(setupPayloads).where(eq(setupPayloads.setupId, setupId));
  if (draft.payloads.length === 0) return;
  await tx.insert(setupPayloads).values(payloadRowsFromDraft(setupId, draft, () => randomUUID()));
}

const audit = (tx: Tx, actorId: string, action: string, setupId: string, detail: Record<string, unknown> = {}) =>
  recordAudit(tx, { actorId, action, entityType: "setup", entityId: setupId, detail });

/** The owner's view of a setup's version and status, read inside the writing transaction. */
async function readOwnedVersion(tx: Tx, id: string, ownerId: string): Promise<{ version: number; status: SetupStatus } | null> {
  const [row] = await tx
    .select({ version: setups.version, status: setups.status })
    .from(setups)
    .where(and(eq(setups.id, id), eq(setups.ownerId, ownerId)));
  return row ?? null;
}

export async function createSetup({
  ownerId,
  draft,
  evaluated,
}: {
  ownerId: string;
  draft: SetupDraft;
  evaluated: Evaluated;
}): Promise<string> {
  const id = randomUUID();
  await getDb().transaction(async (tx) => {
    await tx.insert(setups).values({
      id,
      ownerId,
      ...columnsFromDraft(draft),
      ...summaryColumns(draft, evaluated.result),
      status: "draft",
      version: 1,
      worstFlag: evaluated.worstFlag,
    });
    await replaceResult(tx, id, evaluated.result);
    await replacePayloads(tx, id, draft);
    await audit(tx, ownerId, "setup.create", id);
  });
  return id;
}

export type SaveOutcome =
  { kind: "saved"; version: number; status: SetupStatus } | { kind: "not_found" } | { kind: "conflict"; currentVersion: number };

/**
 * Writes a setup only if nobody saved since `expectedVersion` was read (optimistic concurrency).
 * The workflow decides the status after an edit (a reviewed setup needs a new review).
 */
export async function saveSetup({
  id,
  owner,
  expectedVersion,
  draft,
  evaluated,
}: {
  id: string;
  owner: { id: string; role: Role };
  expectedVersion: number;
  draft: SetupDraft;
  evaluated: Evaluated;
}): Promise<SaveOutcome> {
  return getDb().transaction(async (tx) => {
    const current = await readOwnedVersion(tx, id, owner.id);
    if (!current) return { kind: "not_found" };
    if (current.version !== expectedVersion) return { kind: "conflict", currentVersion: current.version };
    const verdict = nextStatus({ action: "edit", from: current.status, isOwner: true, role: owner.role });
    if (!verdict.ok) throw new Error(`workflow: an owner's edit was refused from ${current.status}`);
    const updated = await tx
      .update(setups)
      .set({
        ...columnsFromDraft(draft),
        ...summaryColumns(draft, evaluated.result),
        status: verdict.to,
        version: expectedVersion + 1,
        worstFlag: evaluated.worstFlag,
        cautionsAcknowledged: false,
        updatedAt: new Date(),
      })
      .where(and(eq(setups.id, id), eq(setups.version, expectedVersion)))
      .returning({ version: setups.version });
    if (updated.length === 0) return { kind: "conflict", currentVersion: expectedVersion + 1 };
    await replaceResult(tx, id, evaluated.result);
    await replacePayloads(tx, id, draft);
    await audit(tx, owner.id, "setup.save", id, { version: expectedVersion + 1, from: current.status, to: verdict.to });
    return { kind: "saved", version: expectedVersion + 1, status: verdict.to };
  });
}

export type SubmitOutcome =
  | { kind: "submitted"; version: number }
  | { kind: "not_found" }
  | { kind: "conflict"; currentVersion: number }
  | { kind: "wrong_status"; message: string };

/** Hands a setup to review; `mail` renders the messages to queue with it, from the facts read in the transaction. */
export async function markSetupSubmitted({
  id,
  owner,
  expectedVersion,
  evaluated,
  mail,
}: {
  id: string;
  owner: { id: string; role: Role };
  expectedVersion: number;
  evaluated: Evaluated;
  mail: (facts: { setupName: string; modelName: string; payloadMassKg: number; reviewerAddresses: string[] }) => OutgoingMail[];
}): Promise<SubmitOutcome> {
  return getDb().transaction(async (tx) => {
    const current = await readOwnedVersion(tx, id, owner.id);
    if (!current) return { kind: "not_found" };
    if (current.version !== expectedVersion) return { kind: "conflict", currentVersion: current.version };
    const verdict = nextStatus({ action: "submit", from: current.status, isOwner: true, role: owner.role });
    if (!verdict.ok) return { kind: "wrong_status", message: verdict.message };
    const [updated] = await tx
      .update(setups)
      .set({
        status: verdict.to,
        version: expectedVersion + 1,
        freeLiftRatio: evaluated.result.freeLiftRatio,
        worstFlag: evaluated.worstFlag,
        cautionsAcknowledged: evaluated.worstFlag === "caution",
        submittedAt: new Date(),
        updatedAt: new Date(),
      })
      .where(eq(setups.id, id))
      .returning({ name: setups.name, modelId: setups.modelId, payloadMassKg: setups.payloadMassKg });
    await replaceResult(tx, id, evaluated.result);
    await audit(tx, owner.id, "setup.submit", id, {
      version: expectedVersion + 1,
      from: current.status,
      to: verdict.to,
      worstFlag: evaluated.worstFlag,
    });
    const [model] = await tx.select({ name: envelopeModels.name }).from(envelopeModels).where(eq(envelopeModels.id, updated.modelId));
    const reviewers = await tx.select({ email: user.email }).from(user).where(eq(user.role, "support"));
    await enqueueMail(
      tx,
      mail({
        setupName: updated.name,
        modelName: model?.name ?? "",
        payloadMassKg: updated.payloadMassKg,
        reviewerAddresses: reviewers.map((r) => r.email),
      }),
    );
    return { kind: "submitted", version: expectedVersion + 1 };
  });
}

/** Deletes one of the owner's setups (its payloads, comments and decisions go with it); false when it is not theirs. */
/** Deletes the owner's setup and its rows; null when there is none, else the storage keys of its attachments (their objects are the caller's to delete after the commit). */
export async function deleteSetup({ id, ownerId }: { id: string; ownerId: string }): Promise<{ storageKeys: string[] } | null> {
  return getDb().transaction(async (tx) => {
    const storageKeys = await deleteAttachmentRowsOfSetup(tx, { setupId: id, ownerId });
    const deleted = await tx
      .delete(setups)
      .where(and(eq(setups.id, id), eq(setups.ownerId, ownerId)))
      .returning({ id: setups.id });
    if (!deleted.length) return null;
    await audit(tx, ownerId, "setup.delete", id);
    return { storageKeys };
  });
}
