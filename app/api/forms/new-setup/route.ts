import { createSetupBodySchema } from "@/app/api/setups/schema";
import { newSetupFailurePath } from "@/components/setups/new-setup-address";
import { ok } from "@/lib/errors";
import { route } from "@/lib/server/route";
import { createSetup } from "@/lib/server/setups";

/**
 * POST /api/forms/new-setup — the Setups page's new-setup form as a browser posts it without JavaScript
 * (`modelId`, `name`): the schema and core of POST /api/setups, answered with a 303 to the new setup's
 * Planner, or back to the list saying what to fix (a stranger to sign-in).
 */
export const POST = route({ body: createSetupBodySchema, form: { failedTo: newSetupFailurePath } }, async ({ viewer, body }) => {
  const made = await createSetup({ viewer, input: body });
  return made.ok ? ok({ location: `/setups/${encodeURIComponent(made.data.id)}` }) : made;
});
