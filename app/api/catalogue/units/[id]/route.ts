import { MAKER_ONLY } from "@/lib/domain";
import { deleteCatalogueItem, getEnvelopeUnit, saveEnvelopeUnit } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { envelopeUnitValuesSchema, itemParamsSchema } from "../../schema";

const spec = { roles: MAKER_ONLY, params: itemParamsSchema, notFoundMessage: "No such serial unit." };

/** GET /api/catalogue/units/:id — one serial unit. */
export const GET = route(spec, ({ viewer, params }) => getEnvelopeUnit({ viewer, id: params.id }));

/** PUT /api/catalogue/units/:id — replaces its values (setups that name it see the change). */
export const PUT = route({ ...spec, body: envelopeUnitValuesSchema }, ({ viewer, params, body }) =>
  saveEnvelopeUnit({ viewer, id: params.id, values: body }),
);

/** DELETE /api/catalogue/units/:id — only when no setup uses it (409 otherwise: retire it instead). */
export const DELETE = route({ ...spec, status: 204 }, ({ viewer, params }) =>
  deleteCatalogueItem({ viewer, kind: "units", id: params.id }),
);
