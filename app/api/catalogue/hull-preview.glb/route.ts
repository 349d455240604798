import { MAKER_ONLY } from "@/lib/domain";
import { hullPreviewGlb } from "@/lib/server/catalogue";
import { route } from "@/lib/server/route";
import { hullPreviewQuerySchema } from "../schema";

/** GET /api/catalogue/hull-preview.glb?hull=<json> — the Workshop's live preview of hull parameters not yet saved. */
export const GET = route({ roles: MAKER_ONLY, query: hullPreviewQuerySchema, respond: "file" }, ({ viewer, query }) =>
  hullPreviewGlb({ viewer, hull: query.hull }),
);
