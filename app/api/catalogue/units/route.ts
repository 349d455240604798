import { MAKER_ONLY } from "@/lib/domain";
import { listCatalogue, saveEnvelopeUnit } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { envelopeUnitValuesSchema, pageQuerySchema } from "../schema";

/** GET /api/catalogue/units?page= — the Workshop's serial units, a page at a time, with how many setups use each. */
export const GET = route({ roles: MAKER_ONLY, query: pageQuerySchema }, ({ viewer, query }) =>
  listCatalogue({ viewer, kind: "units", page: query.page }),
);

/** POST /api/catalogue/units — adds a serial unit. */
export const POST = route({ roles: MAKER_ONLY, body: envelopeUnitValuesSchema, status: 201 }, ({ viewer, body }) =>
  saveEnvelopeUnit({ viewer, id: null, values: body }),
);
