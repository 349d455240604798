import { operatingEnvelopeRequestSchema } from "@/lib/balance";
import { operatingEnvelopeOf } from "@/lib/server/balance";
import { route } from "@/lib/server/route";

/** POST /api/balance/envelope — the operating envelope of one BalanceInput (`{ setup, options? }`); signed-in users. */
export const POST = route({ body: operatingEnvelopeRequestSchema }, ({ body }) => operatingEnvelopeOf({ request: body }));
