import { route } from "@/lib/server/route";
import { SETUP_NOT_FOUND, duplicateSetup } from "@/lib/server/setups";
import { setupParamsSchema } from "../../schema";

/** POST /api/setups/:id/duplicate — a new draft copied from one of the caller's setups. */
export const POST = route({ params: setupParamsSchema, notFoundMessage: SETUP_NOT_FOUND, status: 201 }, ({ viewer, params: { id } }) =>
  duplicateSetup({ viewer, id }),
);
