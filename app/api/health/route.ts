import { getHealth } from "@/lib/server/health";
import { route } from "@/lib/server/route";

/** GET /api/health — public: 200 with the database's state when it is ready, 503 with it when not. */
export const GET = route({ access: "public" }, () => getHealth());
