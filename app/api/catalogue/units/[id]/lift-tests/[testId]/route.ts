import { MAKER_ONLY } from "@/lib/domain";
import { removeUnitLiftTest } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { liftTestParamsSchema } from "../../../../schema";

/** DELETE /api/catalogue/units/:id/lift-tests/:testId — removes a test recorded in error. */
export const DELETE = route(
  { roles: MAKER_ONLY, params: liftTestParamsSchema, notFoundMessage: "No such lift test.", status: 204 },
  ({ viewer, params }) => removeUnitLiftTest({ viewer, unitId: params.id, testId: params.testId }),
);
