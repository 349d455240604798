import { MAKER_ONLY } from "@/lib/domain";
import { route } from "@/lib/server/route";
import { exportSetupsCsv } from "@/lib/server/setup-export";

/** GET /api/insight/setups.csv — every setup, one row each, SI units in the header names; maker only. */
export const GET = route({ roles: MAKER_ONLY, respond: "file" }, () => exportSetupsCsv());
