import { getSetupHistory } from "@/lib/server/review";
import { route } from "@/lib/server/route";
import { setupParamsSchema } from "../../schema";

/** GET /api/setups/:id/history — the setup's audit entries (who, when, from, to, reason); the owner, support, maker. */
export const GET = route({ params: setupParamsSchema }, ({ viewer, params: { id } }) => getSetupHistory({ viewer, id }));
