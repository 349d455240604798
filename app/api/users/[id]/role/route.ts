import { setUserRole } from "@/db/queries/users";
import { MAKER_ONLY } from "@/lib/domain";
import { requireApiViewer } from "@/lib/auth/guard";
import { errorResponse } from "@/lib/errors";
import { readValidBody } from "@/lib/http/read-json-body";
import { roleChangeSchema, userIdSchema } from "./schema";

/** PUT /api/users/:id/role — the maker changes one account's role. */
export async function PUT(request: Request, ctx: RouteContext<"/api/users/[id]/role">) {
  const access = await requireApiViewer(MAKER_ONLY);
  if (!access.ok) return access.response;
  const id = userIdSchema.safeParse((await ctx.params).id);
  if (!id.success) return errorResponse({ code: "bad_request", message: "Bad account id." });
  const parsed = await readValidBody(request, roleChangeSchema, "Invalid role change.");
  if (!parsed.ok) return errorResponse(parsed.error);
  if (id.data === access.viewer.id && parsed.data.role !== "maker") {
    return errorResponse({ code: "bad_request", message: "You cannot take the maker role from your own account." });
  }
  const found = await setUserRole({ userId: id.data, role: parsed.data.role, actorId: access.viewer.id });
  if (!found) return errorResponse({ code: "not_found", message: "No such account." });
  return Response.json({ id: id.data, role: parsed.data.role });
}
