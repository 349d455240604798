import { MAKER_ONLY } from "@/lib/domain";
import { deleteCatalogueItem, getEnvelopeModel, saveEnvelopeModel } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { envelopeModelValuesSchema, itemParamsSchema } from "../../schema";

const spec = { roles: MAKER_ONLY, params: itemParamsSchema, notFoundMessage: "No such envelope model." };

/** GET /api/catalogue/models/:id — one envelope model. */
export const GET = route(spec, ({ viewer, params }) => getEnvelopeModel({ viewer, id: params.id }));

/** PUT /api/catalogue/models/:id — replaces its values (setups that name it see the change). */
export const PUT = route({ ...spec, body: envelopeModelValuesSchema }, ({ viewer, params, body }) =>
  saveEnvelopeModel({ viewer, id: params.id, values: body }),
);

/** DELETE /api/catalogue/models/:id — only when no setup uses it (409 otherwise: retire it instead). */
export const DELETE = route({ ...spec, status: 204 }, ({ viewer, params }) =>
  deleteCatalogueItem({ viewer, kind: "models", id: params.id }),
);
