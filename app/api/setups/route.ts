import { route } from "@/lib/server/route";
import { createSetup, listOwnSetups } from "@/lib/server/setups";
import { createSetupBodySchema } from "./schema";

/** GET /api/setups — the signed-in person's own setups. */
export const GET = route({}, ({ viewer }) => listOwnSetups({ viewer }));

/** POST /api/setups — a new draft owned by the caller (`{ draft }` or `{ modelId }`), with the server's balance stored. */
export const POST = route({ body: createSetupBodySchema, status: 201 }, ({ viewer, body }) => createSetup({ viewer, input: body }));
