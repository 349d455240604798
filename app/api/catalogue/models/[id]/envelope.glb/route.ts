import { envelopeModelGlb } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { itemParamsSchema } from "../../../schema";

/** GET /api/catalogue/models/:id/envelope.glb — the envelope built from the model's stored hull, with an ETag (304 when unchanged). Anyone signed in: the Planner and the review desk draw it. */
export const GET = route({ params: itemParamsSchema, notFoundMessage: "No such envelope model.", respond: "file" }, ({ viewer, params }) =>
  envelopeModelGlb({ viewer, id: params.id }),
);
