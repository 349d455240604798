import { MAKER_ONLY } from "@/lib/domain";
import { addUnitLiftTest } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { itemParamsSchema, liftTestValuesSchema } from "../../../schema";

/** POST /api/catalogue/units/:id/lift-tests — records a lift test; answers the unit's new calibration factor. */
export const POST = route(
  { roles: MAKER_ONLY, params: itemParamsSchema, notFoundMessage: "No such serial unit.", body: liftTestValuesSchema, status: 201 },
  ({ viewer, params, body }) => addUnitLiftTest({ viewer, unitId: params.id, values: body }),
);
