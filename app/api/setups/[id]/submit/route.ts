import { getSetupById } from "@/db/queries/planner";
import { markSetupSubmitted } from "@/db/queries/setup-writes";
import { requireApiViewer } from "@/lib/auth/guard";
import { errorResponse } from "@/lib/errors";
import { readValidBody } from "@/lib/http/read-json-body";
import { evaluateDraftOnServer } from "@/lib/setups/evaluate-on-server";
import { setupIdSchema, submitSetupBodySchema } from "../../schema";

/**
 * POST /api/setups/:id/submit — hand a saved setup to the review desk. The server re-evaluates the
 * stored input: any `stop` flag refuses (422); `caution` flags need acknowledgeCautions: true.
 */
export async function POST(request: Request, ctx: RouteContext<"/api/setups/[id]/submit">) {
  const access = await requireApiViewer();
  if (!access.ok) return access.response;
  const id = setupIdSchema.safeParse((await ctx.params).id);
  if (!id.success) return errorResponse({ code: "not_found", message: "No such setup among yours." });
  const parsed = await readValidBody(request, submitSetupBodySchema, "Invalid submit request.");
  if (!parsed.ok) return errorResponse(parsed.error);

  const setup = await getSetupById({ id: id.data, ownerId: access.viewer.id });
  if (!setup) return errorResponse({ code: "not_found", message: "No such setup among yours." });
  const evaluated = await evaluateDraftOnServer({ draft: setup.draft, ownerId: access.viewer.id });
  if (!evaluated.ok) return errorResponse(evaluated.error);
  const stops = evaluated.data.result.flags.filter((f) => f.level === "stop");
  if (stops.length) {
    return errorResponse({
      code: "unprocessable",
      message: `It cannot be submitted while a stop flag stands: ${stops.map((f) => f.message).join(" ")}`,
      issues: stops.map((f) => ({ path: `flags.${f.code}`, message: f.message })),
    });
  }
  if (evaluated.data.worstFlag === "caution" && !parsed.data.acknowledgeCautions) {
    return errorResponse({ code: "unprocessable", message: "Acknowledge the caution flags before you submit." });
  }
  const outcome = await markSetupSubmitted({ id: id.data, ownerId: access.viewer.id, expectedVersion: parsed.data.version, evaluated: evaluated.data });
  if (outcome.kind === "not_found") return errorResponse({ code: "not_found", message: "No such setup among yours." });
  if (outcome.kind === "conflict") return errorResponse({ code: "conflict", message: `This setup was saved elsewhere since you opened it (now version ${outcome.currentVersion}). Reload before submitting.` });
  if (outcome.kind === "wrong_status") return errorResponse({ code: "conflict", message: `A setup that is ${outcome.status.replace("_", " ")} cannot be submitted again.` });
  return Response.json({ id: id.data, version: outcome.version, status: "submitted" });
}
