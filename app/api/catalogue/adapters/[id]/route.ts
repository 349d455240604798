import { MAKER_ONLY } from "@/lib/domain";
import { deleteCatalogueItem, getCatalogueItem, saveCatalogueItem } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { adapterValuesSchema, itemParamsSchema } from "../../schema";

const spec = { roles: MAKER_ONLY, params: itemParamsSchema, notFoundMessage: "No such adapter." };

/** GET /api/catalogue/adapters/:id — one adapter. */
export const GET = route(spec, ({ viewer, params }) => getCatalogueItem({ viewer, kind: "adapters", id: params.id }));

/** PUT /api/catalogue/adapters/:id — replaces its values (setups that name it see the change). */
export const PUT = route({ ...spec, body: adapterValuesSchema }, ({ viewer, params, body }) =>
  saveCatalogueItem({ viewer, kind: "adapters", id: params.id, values: body }),
);

/** DELETE /api/catalogue/adapters/:id — only when no setup uses it (409 otherwise: retire it instead). */
export const DELETE = route({ ...spec, status: 204 }, ({ viewer, params }) =>
  deleteCatalogueItem({ viewer, kind: "adapters", id: params.id }),
);
