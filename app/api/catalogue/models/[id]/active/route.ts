import { MAKER_ONLY } from "@/lib/domain";
import { setCatalogueItemActive } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { activeBodySchema, itemParamsSchema } from "../../../schema";

/** PUT /api/catalogue/models/:id/active { active } — retires (hidden from new setups; old ones keep it) or restores. */
export const PUT = route(
  { roles: MAKER_ONLY, params: itemParamsSchema, notFoundMessage: "No such envelope model.", body: activeBodySchema },
  ({ viewer, params, body }) => setCatalogueItemActive({ viewer, kind: "models", id: params.id, active: body.active }),
);
