import { route } from "@/lib/server/route";
import { SETUP_NOT_FOUND, deleteSetup, getSetup, saveSetup } from "@/lib/server/setups";
import { saveSetupBodySchema, setupParamsSchema } from "../schema";

const params = setupParamsSchema;
const notFoundMessage = SETUP_NOT_FOUND;

/** GET /api/setups/:id — a setup with its stored balance: the caller's own, or (support, maker) a submitted one. */
export const GET = route({ params, notFoundMessage }, ({ viewer, params: { id } }) => getSetup({ viewer, id }));

/** PUT /api/setups/:id — save with the version that was read; 409 when someone saved since. */
export const PUT = route({ params, notFoundMessage, body: saveSetupBodySchema }, ({ viewer, params: { id }, body }) =>
  saveSetup({ viewer, id, version: body.version, draft: body.draft }),
);

/** DELETE /api/setups/:id — the setup and everything hung on it. */
export const DELETE = route({ params, notFoundMessage, status: 204 }, ({ viewer, params: { id } }) => deleteSetup({ viewer, id }));
