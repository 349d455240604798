import { route } from "@/lib/server/route";
import { SETUP_NOT_FOUND, submitSetup } from "@/lib/server/setups";
import { setupParamsSchema, submitSetupBodySchema } from "../../schema";

/** POST /api/setups/:id/submit — hand a saved setup to the review desk (422 while a stop flag stands). */
export const POST = route(
  { params: setupParamsSchema, notFoundMessage: SETUP_NOT_FOUND, body: submitSetupBodySchema },
  ({ viewer, params: { id }, body }) => submitSetup({ viewer, id, version: body.version, acknowledgeCautions: body.acknowledgeCautions }),
);
