import { STAFF_ROLES } from "@/lib/domain";
import { decideOnSetup } from "@/lib/server/review";
import { route } from "@/lib/server/route";
import { decisionBodySchema, setupParamsSchema } from "../../schema";

/** POST /api/setups/:id/decision — `{ decision, reason, reasonCodes?, version }`; support and maker; 409 on a stale version. */
export const POST = route({ roles: STAFF_ROLES, params: setupParamsSchema, body: decisionBodySchema }, ({ viewer, params: { id }, body }) =>
  decideOnSetup({ viewer, id, ...body }),
);
