import "server-only";
import { getCatalogueForDraft } from "@/db/queries/planner";
import { balanceInputSchema, evaluateBalance, worstLevel, type BalanceResult, type FlagLevel } from "@/lib/balance";
import { fail, issuesFromZod, ok, type Result } from "@/lib/errors";
import { toBalanceInput } from "./balance-input";
import type { SetupDraft } from "./setup-draft";

export interface ServerEvaluation {
  result: BalanceResult;
  worstFlag: FlagLevel;
}

/**
 * The server's own balance of a draft: it looks the named catalogue rows up itself and never takes
 * a number from the client's result. Unknown names are a 400 with the field at fault.
 */
export async function evaluateDraftOnServer({ draft, ownerId }: { draft: SetupDraft; ownerId: string }): Promise<Result<ServerEvaluation>> {
  const found = await getCatalogueForDraft({ draft, ownerId });
  if (!found.model) return fail("bad_request", "That envelope model does not exist.", [{ path: "draft.modelId", message: "unknown model" }]);
  if (!found.mount) return fail("bad_request", "That mount does not exist.", [{ path: "draft.mountId", message: "unknown mount" }]);
  if (found.unitMissing) return fail("bad_request", "That serial unit is not one of yours.", [{ path: "draft.unitId", message: "unknown unit" }]);
  if (found.unitModelMismatch) return fail("bad_request", "That serial unit is of another envelope model.", [{ path: "draft.unitId", message: "unit of another model" }]);
  if (found.missingAdapterIds.length) {
    return fail("bad_request", "A payload names an adapter that does not exist.", [{ path: "draft.payloads", message: `unknown adapter ${found.missingAdapterIds[0]}` }]);
  }
  const input = toBalanceInput(draft, { model: found.model, unit: found.unit, mount: found.mount, adaptersById: found.adaptersById });
  const checked = balanceInputSchema.safeParse(input);
  if (!checked.success) return fail("bad_request", "The setup does not make a valid balance input.", issuesFromZod(checked.error));
  const result = evaluateBalance(checked.data);
  return ok({ result, worstFlag: worstLevel(result.flags) });
}
