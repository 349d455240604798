"use server";
import { revalidatePath } from "next/cache";
import { redirect } from "next/navigation";
import { z } from "zod";
import { getPlannerCatalogue, getSetupById } from "@/db/queries/planner";
import { createSetup, deleteSetups } from "@/db/queries/setup-writes";
import { requireActionViewer } from "@/lib/auth/guard";
import { fail, issuesFromZod, ok, type Result } from "@/lib/errors";
import { defaultDraft } from "@/lib/setups/default-draft";
import { evaluateDraftOnServer } from "@/lib/setups/evaluate-on-server";

const newSetupSchema = z.object({ modelId: z.string().min(1, "Pick an envelope model.").max(64) });
const setupIdSchema = z.object({ id: z.string().min(1).max(64) });

export async function createSetupAction(_previous: Result<null> | null, formData: FormData): Promise<Result<null>> {
  const parsed = newSetupSchema.safeParse({ modelId: formData.get("modelId") });
  if (!parsed.success) return fail("bad_request", "Pick an envelope model.", issuesFromZod(parsed.error));
  const access = await requireActionViewer();
  if (!access.ok) return access;
  const catalogue = await getPlannerCatalogue({ ownerId: access.data.id });
  const model = catalogue.models.find((m) => m.id === parsed.data.modelId);
  const mount = catalogue.mounts[0];
  if (!model || !mount) return fail("bad_request", "That envelope model is not in the catalogue.");
  const draft = defaultDraft(model, mount.id);
  const evaluated = await evaluateDraftOnServer({ draft, ownerId: access.data.id });
  if (!evaluated.ok) return evaluated;
  const id = await createSetup({ ownerId: access.data.id, draft, evaluated: evaluated.data });
  redirect(`/setups/${id}`);
}

export async function duplicateSetupAction(input: { id: string }): Promise<Result<{ id: string }>> {
  const parsed = setupIdSchema.safeParse(input);
  if (!parsed.success) return fail("bad_request", "No such setup.");
  const access = await requireActionViewer();
  if (!access.ok) return access;
  const source = await getSetupById({ id: parsed.data.id, ownerId: access.data.id });
  if (!source) return fail("not_found", "No such setup among yours.");
  const draft = { ...source.draft, name: `Copy of ${source.draft.name}`.slice(0, 120) };
  const evaluated = await evaluateDraftOnServer({ draft, ownerId: access.data.id });
  if (!evaluated.ok) return evaluated;
  const id = await createSetup({ ownerId: access.data.id, draft, evaluated: evaluated.data });
  revalidatePath("/setups");
  return ok({ id });
}

export async function deleteSetupAction(input: { id: string }): Promise<Result<{ id: string }>> {
  const parsed = setupIdSchema.safeParse(input);
  if (!parsed.success) return fail("bad_request", "No such setup.");
  const access = await requireActionViewer();
  if (!access.ok) return access;
  const deleted = await deleteSetups({ ids: [parsed.data.id], ownerId: access.data.id });
  if (!deleted) return fail("not_found", "No such setup among yours.");
  revalidatePath("/setups");
  return ok({ id: parsed.data.id });
}
