import { MAKER_ONLY } from "@/lib/domain";
import { listCatalogue, saveCatalogueItem } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { mountValuesSchema, pageQuerySchema } from "../schema";

/** GET /api/catalogue/mounts?page= — the Workshop's mounts, a page at a time, with how many setups use each. */
export const GET = route({ roles: MAKER_ONLY, query: pageQuerySchema }, ({ viewer, query }) =>
  listCatalogue({ viewer, kind: "mounts", page: query.page }),
);

/** POST /api/catalogue/mounts — adds a mount. */
export const POST = route({ roles: MAKER_ONLY, body: mountValuesSchema, status: 201 }, ({ viewer, body }) =>
  saveCatalogueItem({ viewer, kind: "mounts", id: null, values: body }),
);
