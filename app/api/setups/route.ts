import { listSetupsForOwner } from "@/db/queries/setups";
import { createSetup } from "@/db/queries/setup-writes";
import { requireApiViewer } from "@/lib/auth/guard";
import { errorResponse } from "@/lib/errors";
import { readValidBody } from "@/lib/http/read-json-body";
import { evaluateDraftOnServer } from "@/lib/setups/evaluate-on-server";
import { createSetupBodySchema } from "./schema";

/** GET /api/setups — the signed-in person's own setups. */
export async function GET() {
  const access = await requireApiViewer();
  if (!access.ok) return access.response;
  const setups = await listSetupsForOwner({ ownerId: access.viewer.id });
  return Response.json({ setups });
}

/** POST /api/setups — a new draft owned by the caller, with the server's balance stored. */
export async function POST(request: Request) {
  const access = await requireApiViewer();
  if (!access.ok) return access.response;
  const parsed = await readValidBody(request, createSetupBodySchema, "The setup is not valid.");
  if (!parsed.ok) return errorResponse(parsed.error);
  const evaluated = await evaluateDraftOnServer({ draft: parsed.data.draft, ownerId: access.viewer.id });
  if (!evaluated.ok) return errorResponse(evaluated.error);
  const id = await createSetup({ ownerId: access.viewer.id, draft: parsed.data.draft, evaluated: evaluated.data });
  return Response.json({ id, version: 1, result: evaluated.data.result }, { status: 201 });
}
