import { STAFF_ROLES } from "@/lib/domain";
import { listReviewQueue } from "@/lib/server/review";
import { route } from "@/lib/server/route";

/** GET /api/review/queue — submitted setups from every customer; support and maker only. */
export const GET = route({ roles: STAFF_ROLES }, () => listReviewQueue());
