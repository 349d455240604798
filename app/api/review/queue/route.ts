import { STAFF_ROLES } from "@/lib/domain";
import { listReviewQueue } from "@/lib/server/review";
import { route } from "@/lib/server/route";
import { queueQuerySchema } from "./schema";

/** GET /api/review/queue?status=&worst=&model=&q=&sort=&dir=&page=&pageSize= — setups for review; support and maker only. */
export const GET = route({ roles: STAFF_ROLES, query: queueQuerySchema }, ({ query }) => listReviewQueue({ filter: query }));
