import { MAKER_ONLY } from "@/lib/domain";
import { deleteCatalogueItem, getCatalogueItem, saveCatalogueItem } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { payloadTemplateValuesSchema, itemParamsSchema } from "../../schema";

const spec = { roles: MAKER_ONLY, params: itemParamsSchema, notFoundMessage: "No such payload template." };

/** GET /api/catalogue/templates/:id — one payload template. */
export const GET = route(spec, ({ viewer, params }) => getCatalogueItem({ viewer, kind: "templates", id: params.id }));

/** PUT /api/catalogue/templates/:id — replaces its values (setups that name it see the change). */
export const PUT = route({ ...spec, body: payloadTemplateValuesSchema }, ({ viewer, params, body }) =>
  saveCatalogueItem({ viewer, kind: "templates", id: params.id, values: body }),
);

/** DELETE /api/catalogue/templates/:id — only when no setup uses it (409 otherwise: retire it instead). */
export const DELETE = route({ ...spec, status: 204 }, ({ viewer, params }) =>
  deleteCatalogueItem({ viewer, kind: "templates", id: params.id }),
);
