import { STAFF_ROLES } from "@/lib/domain";
import { getInsight } from "@/lib/server/insight";
import { route } from "@/lib/server/route";
import { insightQuerySchema } from "./schema";

/** GET /api/insight?model=&from=&to= — payload masses, templates, rail positions, free lift, flags, months; maker (support may read). */
export const GET = route({ roles: STAFF_ROLES, query: insightQuerySchema }, ({ query }) => getInsight({ filter: query }));
