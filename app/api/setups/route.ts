import { route } from "@/lib/server/route";
import { createSetup, listOwnSetups } from "@/lib/server/setups";
import { createSetupBodySchema, pageQuerySchema } from "./schema";

/** GET /api/setups?page=&pageSize= — the signed-in person's own setups, most recently changed first. */
export const GET = route({ query: pageQuerySchema }, ({ viewer, query }) => listOwnSetups({ viewer, ...query }));

/** POST /api/setups — a new draft owned by the caller (`{ draft }` or `{ modelId }`), with the server's balance stored. */
export const POST = route({ body: createSetupBodySchema, status: 201 }, ({ viewer, body }) => createSetup({ viewer, input: body }));
