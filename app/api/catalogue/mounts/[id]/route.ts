import { MAKER_ONLY } from "@/lib/domain";
import { deleteCatalogueItem, getCatalogueItem, saveCatalogueItem } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { mountValuesSchema, itemParamsSchema } from "../../schema";

const spec = { roles: MAKER_ONLY, params: itemParamsSchema, notFoundMessage: "No such mount." };

/** GET /api/catalogue/mounts/:id — one mount. */
export const GET = route(spec, ({ viewer, params }) => getCatalogueItem({ viewer, kind: "mounts", id: params.id }));

/** PUT /api/catalogue/mounts/:id — replaces its values (setups that name it see the change). */
export const PUT = route({ ...spec, body: mountValuesSchema }, ({ viewer, params, body }) =>
  saveCatalogueItem({ viewer, kind: "mounts", id: params.id, values: body }),
);

/** DELETE /api/catalogue/mounts/:id — only when no setup uses it (409 otherwise: retire it instead). */
export const DELETE = route({ ...spec, status: 204 }, ({ viewer, params }) =>
  deleteCatalogueItem({ viewer, kind: "mounts", id: params.id }),
);
