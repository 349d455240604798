import { route } from "@/lib/server/route";
import { setUnitPreference } from "@/lib/server/users";
import { preferencesSchema } from "./schema";

/** PUT /api/me/preferences — the caller's display units, remembered per account. */
export const PUT = route({ body: preferencesSchema }, ({ viewer, body }) => setUnitPreference({ viewer, unitSystem: body.unitSystem }));
