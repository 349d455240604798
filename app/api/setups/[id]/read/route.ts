import { markThreadRead } from "@/lib/server/review";
import { route } from "@/lib/server/route";
import { setupParamsSchema } from "../../schema";

/** PUT /api/setups/:id/read — the caller has read the setup's thread (its comments stop counting as unread). */
export const PUT = route({ params: setupParamsSchema, status: 204 }, ({ viewer, params: { id } }) => markThreadRead({ viewer, id }));
