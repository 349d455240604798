import { MAKER_ONLY } from "@/lib/domain";
import { listCatalogue, saveCatalogueItem } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { adapterValuesSchema, pageQuerySchema } from "../schema";

/** GET /api/catalogue/adapters?page= — the Workshop's adapters, a page at a time, with how many setups use each. */
export const GET = route({ roles: MAKER_ONLY, query: pageQuerySchema }, ({ viewer, query }) =>
  listCatalogue({ viewer, kind: "adapters", page: query.page }),
);

/** POST /api/catalogue/adapters — adds a adapter. */
export const POST = route({ roles: MAKER_ONLY, body: adapterValuesSchema, status: 201 }, ({ viewer, body }) =>
  saveCatalogueItem({ viewer, kind: "adapters", id: null, values: body }),
);
