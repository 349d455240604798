import { z } from "zod";
import { UNIT_SYSTEMS } from "@/db/schema";
import { setUnitSystem } from "@/db/queries/users";
import { requireApiViewer } from "@/lib/auth/guard";
import { errorResponse, issuesFromZod } from "@/lib/errors";
import { readJsonBody } from "@/lib/http/read-json-body";

const preferencesSchema = z.object({ unitSystem: z.enum(UNIT_SYSTEMS, { message: "unitSystem must be metric or imperial" }) });

/** PUT /api/me/preferences — the caller's display units, remembered per account. */
export async function PUT(request: Request) {
  const access = await requireApiViewer();
  if (!access.ok) return access.response;
  const body = await readJsonBody(request);
  if (!body.ok) return errorResponse(body.error);
  const parsed = preferencesSchema.safeParse(body.data);
  if (!parsed.success) return errorResponse({ code: "bad_request", message: "Invalid preferences.", issues: issuesFromZod(parsed.error) });
  await setUnitSystem({ userId: access.viewer.id, unitSystem: parsed.data.unitSystem });
  return Response.json({ unitSystem: parsed.data.unitSystem });
}
