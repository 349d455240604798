import { MAKER_ONLY } from "@/lib/domain";
import { exportTemplatesCsv } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";

/** GET /api/catalogue/templates.csv — every payload template, one row each, SI units in the header names. */
export const GET = route({ roles: MAKER_ONLY, respond: "file" }, ({ viewer }) => exportTemplatesCsv({ viewer }));
