import { getSetupById } from "@/db/queries/planner";
import { deleteSetups, saveSetup } from "@/db/queries/setup-writes";
import { requireApiViewer } from "@/lib/auth/guard";
import { errorResponse } from "@/lib/errors";
import { readValidBody } from "@/lib/http/read-json-body";
import { evaluateDraftOnServer } from "@/lib/setups/evaluate-on-server";
import { saveSetupBodySchema, setupIdSchema } from "../schema";

const notFound = () => errorResponse({ code: "not_found", message: "No such setup among yours." });

/** GET /api/setups/:id — one of the caller's setups with its stored balance. */
export async function GET(_request: Request, ctx: RouteContext<"/api/setups/[id]">) {
  const access = await requireApiViewer();
  if (!access.ok) return access.response;
  const id = setupIdSchema.safeParse((await ctx.params).id);
  if (!id.success) return notFound();
  const setup = await getSetupById({ id: id.data, ownerId: access.viewer.id });
  if (!setup) return notFound();
  const { row, draft } = setup;
  return Response.json({ id: row.id, version: row.version, status: row.status, draft, result: row.resultJson, worstFlag: row.worstFlag });
}

/** PUT /api/setups/:id — save with the version that was read; 409 when someone saved since. */
export async function PUT(request: Request, ctx: RouteContext<"/api/setups/[id]">) {
  const access = await requireApiViewer();
  if (!access.ok) return access.response;
  const id = setupIdSchema.safeParse((await ctx.params).id);
  if (!id.success) return notFound();
  const parsed = await readValidBody(request, saveSetupBodySchema, "The setup is not valid.");
  if (!parsed.ok) return errorResponse(parsed.error);
  const evaluated = await evaluateDraftOnServer({ draft: parsed.data.draft, ownerId: access.viewer.id });
  if (!evaluated.ok) return errorResponse(evaluated.error);
  const outcome = await saveSetup({ id: id.data, ownerId: access.viewer.id, expectedVersion: parsed.data.version, draft: parsed.data.draft, evaluated: evaluated.data });
  if (outcome.kind === "not_found") return notFound();
  if (outcome.kind === "conflict") {
    return errorResponse({
      code: "conflict",
      message: `This setup was saved elsewhere since you opened it (now version ${outcome.currentVersion}). Nothing was overwritten: reload to see the other changes, then apply yours again.`,
    });
  }
  return Response.json({ id: id.data, version: outcome.version, status: outcome.status, result: evaluated.data.result, worstFlag: evaluated.data.worstFlag });
}

/** DELETE /api/setups/:id */
export async function DELETE(_request: Request, ctx: RouteContext<"/api/setups/[id]">) {
  const access = await requireApiViewer();
  if (!access.ok) return access.response;
  const id = setupIdSchema.safeParse((await ctx.params).id);
  if (!id.success) return notFound();
  const deleted = await deleteSetups({ ids: [id.data], ownerId: access.viewer.id });
  return deleted ? new Response(null, { status: 204 }) : notFound();
}
