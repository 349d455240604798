import { MAKER_ONLY } from "@/lib/domain";
import { listCatalogue, saveCatalogueItem } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { payloadTemplateValuesSchema, pageQuerySchema } from "../schema";

/** GET /api/catalogue/templates?page= — the Workshop's payload templates, a page at a time, with how many setups use each. */
export const GET = route({ roles: MAKER_ONLY, query: pageQuerySchema }, ({ viewer, query }) =>
  listCatalogue({ viewer, kind: "templates", page: query.page }),
);

/** POST /api/catalogue/templates — adds a payload template. */
export const POST = route({ roles: MAKER_ONLY, body: payloadTemplateValuesSchema, status: 201 }, ({ viewer, body }) =>
  saveCatalogueItem({ viewer, kind: "templates", id: null, values: body }),
);
