import { z } from "zod";
import { UNIT_SYSTEMS } from "@/lib/domain";
import { setUnitSystem } from "@/db/queries/users";
import { requireApiViewer } from "@/lib/auth/guard";
import { errorResponse } from "@/lib/errors";
import { readValidBody } from "@/lib/http/read-json-body";

const preferencesSchema = z.object({ unitSystem: z.enum(UNIT_SYSTEMS, { message: "unitSystem must be metric or imperial" }) });

/** PUT /api/me/preferences — the caller's display units, remembered per account. */
export async function PUT(request: Request) {
  const access = await requireApiViewer();
  if (!access.ok) return access.response;
  const parsed = await readValidBody(request, preferencesSchema, "Invalid preferences.");
  if (!parsed.ok) return errorResponse(parsed.error);
  await setUnitSystem({ userId: access.viewer.id, unitSystem: parsed.data.unitSystem });
  return Response.json({ unitSystem: parsed.data.unitSystem });
}
