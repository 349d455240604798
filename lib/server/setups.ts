import "server-only";
import { getPlannerCatalogue } from "@/db/queries/catalogue";
import * as setupsDb from "@/db/queries/setups";
import type { Viewer } from "@/lib/auth/access";
import type { BalanceResult } from "@/lib/balance";
import { STATUS_WORDS, type FlagLevel, type SetupStatus } from "@/lib/domain";
import { fail, ok, type Result } from "@/lib/errors";
import { defaultDraft } from "@/lib/setups/default-draft";
import type { SetupDraft } from "@/lib/setups/setup-draft";
import { evaluateDraft } from "./evaluate-draft";

// A customer's setups: one function per mutation or served read. Ownership is decided in the
// queries (every one takes the owner's id), so another person's setup is simply not found.

export const SETUP_NOT_FOUND = "No such setup among yours.";
const notFound = () => fail("not_found", SETUP_NOT_FOUND);
const conflict = (currentVersion: number, then: string) =>
  fail("conflict", `This setup was saved elsewhere since you opened it (now version ${currentVersion}). Nothing was overwritten: ${then}`);

export interface SetupView {
  id: string;
  version: number;
  status: SetupStatus;
  draft: SetupDraft;
  result: BalanceResult | null;
  worstFlag: FlagLevel | null;
}

export async function listOwnSetups({ viewer }: { viewer: Viewer }): Promise<Result<{ setups: setupsDb.SetupListItem[] }>> {
  return ok({ setups: await setupsDb.listSetupsForOwner({ ownerId: viewer.id }) });
}

export async function getOwnSetup({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<SetupView>> {
  const setup = await setupsDb.getSetupById({ id, ownerId: viewer.id });
  if (!setup) return notFound();
  const { row, draft } = setup;
  return ok({ id: row.id, version: row.version, status: row.status, draft, result: row.resultJson, worstFlag: row.worstFlag });
}

async function createFromDraft(viewer: Viewer, draft: SetupDraft, path: string): Promise<Result<{ id: string; version: number; result: BalanceResult }>> {
  const evaluated = await evaluateDraft({ draft, ownerId: viewer.id, path });
  if (!evaluated.ok) return evaluated;
  const id = await setupsDb.createSetup({ ownerId: viewer.id, draft, evaluated: evaluated.data });
  return ok({ id, version: 1, result: evaluated.data.result });
}

/** A new draft: the one given, or the neutral start on a model (mount mid-rail, no payloads). */
export async function createSetup({
  viewer,
  input,
}: {
  viewer: Viewer;
  input: { draft: SetupDraft } | { modelId: string };
}): Promise<Result<{ id: string; version: number; result: BalanceResult }>> {
  if ("draft" in input) return createFromDraft(viewer, input.draft, "draft");
  const catalogue = await getPlannerCatalogue({ ownerId: viewer.id });
  const model = catalogue.models.find((m) => m.id === input.modelId);
  const mount = catalogue.mounts[0];
  if (!model || !mount) return fail("bad_request", "That envelope model is not in the catalogue.", [{ path: "modelId", message: "unknown envelope model" }]);
  return createFromDraft(viewer, defaultDraft(model, mount.id), "draft");
}

export async function duplicateSetup({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<{ id: string; version: number; result: BalanceResult }>> {
  const source = await setupsDb.getSetupById({ id, ownerId: viewer.id });
  if (!source) return notFound();
  return createFromDraft(viewer, { ...source.draft, name: `Copy of ${source.draft.name}`.slice(0, 120) }, "draft");
}

/** Saves with the version that was read; a stale version is a conflict and nothing is written. */
export async function saveSetup({
  viewer,
  id,
  version,
  draft,
}: {
  viewer: Viewer;
  id: string;
  version: number;
  draft: SetupDraft;
}): Promise<Result<{ id: string; version: number; status: SetupStatus; result: BalanceResult; worstFlag: FlagLevel }>> {
  const evaluated = await evaluateDraft({ draft, ownerId: viewer.id });
  if (!evaluated.ok) return evaluated;
  const outcome = await setupsDb.saveSetup({ id, ownerId: viewer.id, expectedVersion: version, draft, evaluated: evaluated.data });
  if (outcome.kind === "not_found") return notFound();
  if (outcome.kind === "conflict") return conflict(outcome.currentVersion, "reload to see the other changes, then apply yours again.");
  return ok({ id, version: outcome.version, status: outcome.status, result: evaluated.data.result, worstFlag: evaluated.data.worstFlag });
}

/**
 * Hands a saved setup to the review desk. The server re-evaluates the stored input: any `stop`
 * flag refuses (422), and `caution` flags need the owner's acknowledgement.
 */
export async function submitSetup({
  viewer,
  id,
  version,
  acknowledgeCautions,
}: {
  viewer: Viewer;
  id: string;
  version: number;
  acknowledgeCautions: boolean;
}): Promise<Result<{ id: string; version: number; status: "submitted" }>> {
  const setup = await setupsDb.getSetupById({ id, ownerId: viewer.id });
  if (!setup) return notFound();
  const evaluated = await evaluateDraft({ draft: setup.draft, ownerId: viewer.id });
  if (!evaluated.ok) return evaluated;
  const stops = evaluated.data.result.flags.filter((f) => f.level === "stop");
  if (stops.length) {
    return fail(
      "unprocessable",
      `It cannot be submitted while a stop flag stands: ${stops.map((f) => f.message).join(" ")}`,
      stops.map((f) => ({ path: `flags.${f.code}`, message: f.message })),
    );
  }
  if (evaluated.data.worstFlag === "caution" && !acknowledgeCautions) return fail("unprocessable", "Acknowledge the caution flags before you submit.");
  const outcome = await setupsDb.markSetupSubmitted({ id, ownerId: viewer.id, expectedVersion: version, evaluated: evaluated.data });
  if (outcome.kind === "not_found") return notFound();
  if (outcome.kind === "conflict") return conflict(outcome.currentVersion, "reload before submitting.");
  if (outcome.kind === "wrong_status") return fail("conflict", `A setup that is ${STATUS_WORDS[outcome.status]} cannot be submitted again.`);
  return ok({ id, version: outcome.version, status: "submitted" });
}

export async function deleteSetup({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<null>> {
  return (await setupsDb.deleteSetup({ id, ownerId: viewer.id })) ? ok(null) : notFound();
}
