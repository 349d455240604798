import "server-only";
import { getPlannerCatalogue } from "@/db/queries/catalogue";
import * as setupsDb from "@/db/queries/setups";
import type { Viewer } from "@/lib/auth/access";
import type { BalanceResult } from "@/lib/balance";
import { REVIEWER_ROLES, type FlagLevel, type Role, type SetupStatus } from "@/lib/domain";

const isReviewer = (role: Role) => REVIEWER_ROLES.includes(role);
import { fail, ok, type AppError, type Result } from "@/lib/errors";
import { kickMailDelivery } from "@/lib/mail/deliver";
import { setupSubmittedMail } from "@/lib/mail/templates";
import { appUrl } from "./app-url";
import { deleteStoredAttachmentObjects } from "./attachments";
import { defaultDraft } from "@/lib/setups/default-draft";
import type { SetupDraft } from "@/lib/setups/setup-draft";
import { evaluateDraft } from "./evaluate-draft";

// A customer's setups: one function per mutation or served read. Ownership is decided in the
// queries (every one takes the owner's id), so another person's setup is simply not found.

export const SETUP_NOT_FOUND = "No such setup among yours.";
const notFound = () => fail("not_found", SETUP_NOT_FOUND);

/**
 * The answer when a write names a setup that is not the viewer's: staff who may read it (it was
 * submitted) learn that they cannot change it (403); anyone else learns nothing (404).
 */
async function notYours(viewer: Viewer, id: string): Promise<{ ok: false; error: AppError }> {
  if (isReviewer(viewer.role)) {
    const setup = await setupsDb.getSetupById({ id, ownerId: null });
    if (setup && setup.row.submittedAt !== null)
      return fail("forbidden", "Only the customer who owns this setup can change it; comment on it or decide on it instead.");
  }
  return notFound();
}
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

export async function listOwnSetups({
  viewer,
  page,
  pageSize,
}: {
  viewer: Viewer;
  page: number;
  pageSize: number;
}): Promise<Result<{ setups: setupsDb.SetupListItem[]; total: number; page: number; pageSize: number }>> {
  const { rows, total } = await setupsDb.listSetupsForOwner({ ownerId: viewer.id, page, pageSize });
  return ok({ setups: rows, total, page, pageSize });
}

export async function getOwnSetup({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<SetupView>> {
  const setup = await setupsDb.getSetupById({ id, ownerId: viewer.id });
  if (!setup) return notFound();
  return ok(toView(setup));
}

/** A setup as this viewer may read it: their own, or (for review staff) any that was submitted. */
export async function getSetup({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<SetupView>> {
  const own = await setupsDb.getSetupById({ id, ownerId: viewer.id });
  if (own) return ok(toView(own));
  if (!isReviewer(viewer.role)) return notFound();
  const any = await setupsDb.getSetupById({ id, ownerId: null });
  return any && any.row.submittedAt !== null ? ok(toView(any)) : notFound();
}

function toView(setup: setupsDb.StoredSetup): SetupView {
  const { row, draft, result } = setup;
  return { id: row.id, version: row.version, status: row.status, draft, result, worstFlag: row.worstFlag };
}

async function createFromDraft(
  viewer: Viewer,
  draft: SetupDraft,
  path: string,
  forNewSetup = true,
): Promise<Result<{ id: string; version: number; result: BalanceResult }>> {
  const evaluated = await evaluateDraft({ draft, ownerId: viewer.id, path, forNewSetup });
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
  input: { draft: SetupDraft } | { modelId: string; name?: string };
}): Promise<Result<{ id: string; version: number; result: BalanceResult }>> {
  if ("draft" in input) return createFromDraft(viewer, input.draft, "draft");
  const catalogue = await getPlannerCatalogue({ ownerId: viewer.id });
  const model = catalogue.models.find((m) => m.id === input.modelId);
  const mount = catalogue.mounts[0];
  if (!model || !mount)
    return fail("bad_request", "That envelope model is not in the catalogue.", [{ path: "modelId", message: "unknown envelope model" }]);
  return createFromDraft(viewer, defaultDraft(model, mount.id, input.name), "draft");
}

export async function duplicateSetup({
  viewer,
  id,
}: {
  viewer: Viewer;
  id: string;
}): Promise<Result<{ id: string; version: number; result: BalanceResult }>> {
  const source = await setupsDb.getSetupById({ id, ownerId: viewer.id });
  if (!source) return notYours(viewer, id);
  // A copy of a working setup keeps what it names, retired or not.
  return createFromDraft(viewer, { ...source.draft, name: `Copy of ${source.draft.name}`.slice(0, 120) }, "draft", false);
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
  // Whose it is comes first: a reviewer's draft naming the customer's serial unit must hear 403, not 400.
  if (!(await setupsDb.ownsSetup({ id, ownerId: viewer.id }))) return notYours(viewer, id);
  const evaluated = await evaluateDraft({ draft, ownerId: viewer.id });
  if (!evaluated.ok) return evaluated;
  const outcome = await setupsDb.saveSetup({ id, owner: viewer, expectedVersion: version, draft, evaluated: evaluated.data });
  if (outcome.kind === "not_found") return notYours(viewer, id);
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
  if (!setup) return notYours(viewer, id);
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
  if (evaluated.data.worstFlag === "caution" && !acknowledgeCautions)
    return fail("unprocessable", "Acknowledge the caution flags before you submit.");
  const { result, worstFlag } = evaluated.data;
  const outcome = await setupsDb.markSetupSubmitted({
    id,
    owner: viewer,
    expectedVersion: version,
    evaluated: evaluated.data,
    mail: (facts) =>
      facts.reviewerAddresses.map((to) => ({
        kind: "setup-submitted",
        to,
        content: setupSubmittedMail({
          ...facts,
          customerName: viewer.name,
          worstFlag,
          freeLiftRatio: result.freeLiftRatio,
          url: appUrl(`/review/${id}`),
        }),
      })),
  });
  if (outcome.kind === "not_found") return notYours(viewer, id);
  if (outcome.kind === "conflict") return conflict(outcome.currentVersion, "reload before submitting.");
  if (outcome.kind === "wrong_status") return fail("conflict", outcome.message);
  kickMailDelivery();
  return ok({ id, version: outcome.version, status: "submitted" });
}

/** Deletes the setup and its rows in one transaction; its attachments' objects go after the commit. */
export async function deleteSetup({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<null>> {
  const deleted = await setupsDb.deleteSetup({ id, ownerId: viewer.id });
  if (!deleted) return notYours(viewer, id);
  await deleteStoredAttachmentObjects(deleted.storageKeys);
  return ok(null);
}
