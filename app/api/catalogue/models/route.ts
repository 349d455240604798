import { MAKER_ONLY } from "@/lib/domain";
import { listCatalogue, saveEnvelopeModel } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { envelopeModelValuesSchema, pageQuerySchema } from "../schema";

/** GET /api/catalogue/models?page= — the Workshop's envelope models, a page at a time, with how many setups use each. */
export const GET = route({ roles: MAKER_ONLY, query: pageQuerySchema }, ({ viewer, query }) =>
  listCatalogue({ viewer, kind: "models", page: query.page }),
);

/** POST /api/catalogue/models — adds a envelope model. */
export const POST = route({ roles: MAKER_ONLY, body: envelopeModelValuesSchema, status: 201 }, ({ viewer, body }) =>
  saveEnvelopeModel({ viewer, id: null, values: body }),
);
