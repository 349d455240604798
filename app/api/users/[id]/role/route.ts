import { MAKER_ONLY } from "@/lib/domain";
import { route } from "@/lib/server/route";
import { changeUserRole } from "@/lib/server/users";
import { roleChangeSchema, userParamsSchema } from "./schema";

/** PUT /api/users/:id/role — the maker changes one account's role. */
export const PUT = route(
  { roles: MAKER_ONLY, params: userParamsSchema, notFoundMessage: "No such account.", body: roleChangeSchema },
  ({ viewer, params, body }) => changeUserRole({ viewer, userId: params.id, role: body.role }),
);
