import "server-only";
import { getCatalogueForDraft } from "@/db/queries/catalogue";
import { balanceInputSchema, evaluateBalance, worstLevel, type BalanceInput, type BalanceResult, type FlagLevel } from "@/lib/balance";
import { fail, issuesFromZod, ok, type FieldIssue, type Result } from "@/lib/errors";
import { toBalanceInput } from "@/lib/setups/balance-input";
import type { SetupDraft } from "@/lib/setups/setup-draft";

export interface ServerEvaluation {
  result: BalanceResult;
  worstFlag: FlagLevel;
  /** The engine input the result is of, for what else the server derives from it (the operating envelope). */
  input: BalanceInput;
}

const badName = (message: string, issues: FieldIssue[]) => fail("bad_request", message, issues);

/**
 * The server's own balance of a draft: it looks the named catalogue rows up itself and never takes
 * a number from the client's result. A name that does not exist is a 400 with the field at fault,
 * found here rather than by a foreign-key check in the middle of a write.
 */
export async function evaluateDraft({
  draft,
  ownerId,
  path = "draft",
  forNewSetup = false,
}: {
  draft: SetupDraft;
  ownerId: string;
  path?: string;
  forNewSetup?: boolean;
}): Promise<Result<ServerEvaluation>> {
  const found = await getCatalogueForDraft({ draft, ownerId });
  if (!found.model) return badName("That envelope model does not exist.", [{ path: `${path}.modelId`, message: "unknown envelope model" }]);
  if (!found.mount) return badName("That mount does not exist.", [{ path: `${path}.mountId`, message: "unknown mount" }]);
  if (draft.unitId !== null && !found.unit)
    return badName("That serial unit is not one of yours.", [{ path: `${path}.unitId`, message: "unknown serial unit" }]);
  if (found.unit && found.unit.modelId !== found.model.id) {
    return badName("That serial unit is of another envelope model.", [{ path: `${path}.unitId`, message: "serial unit of another model" }]);
  }
  const unknownNames: FieldIssue[] = draft.payloads.flatMap((p, i) => [
    ...(p.templateId !== null && !found.knownTemplateIds.has(p.templateId)
      ? [{ path: `${path}.payloads[${i}].templateId`, message: "unknown payload template" }]
      : []),
    ...(p.adapterId !== null && !found.adaptersById[p.adapterId]
      ? [{ path: `${path}.payloads[${i}].adapterId`, message: "unknown adapter" }]
      : []),
  ]);
  if (unknownNames.length) return badName("A payload names a template or adapter that does not exist.", unknownNames);
  // Retired items keep old setups working but are not offered to new ones.
  if (forNewSetup) {
    const retired: FieldIssue[] = [
      ...(found.model.active ? [] : [{ path: `${path}.modelId`, message: "retired envelope model" }]),
      ...(found.mount.active ? [] : [{ path: `${path}.mountId`, message: "retired mount" }]),
      ...(found.unit && !found.unit.active ? [{ path: `${path}.unitId`, message: "retired serial unit" }] : []),
      ...draft.payloads.flatMap((p, i) => [
        ...(p.adapterId !== null && found.adaptersById[p.adapterId] && !found.adaptersById[p.adapterId].active
          ? [{ path: `${path}.payloads[${i}].adapterId`, message: "retired adapter" }]
          : []),
        ...(p.templateId !== null && found.retiredTemplateIds.has(p.templateId)
          ? [{ path: `${path}.payloads[${i}].templateId`, message: "retired payload template" }]
          : []),
      ]),
    ];
    if (retired.length) return badName("A new setup cannot use a retired catalogue item.", retired);
  }

  const input = toBalanceInput(draft, { model: found.model, unit: found.unit, mount: found.mount, adaptersById: found.adaptersById });
  const checked = balanceInputSchema.safeParse(input);
  if (!checked.success) return fail("bad_request", "The setup does not make a valid balance input.", issuesFromZod(checked.error));
  const result = evaluateBalance(checked.data);
  return ok({ result, worstFlag: worstLevel(result.flags), input: checked.data });
}

/** Stored results from before flags carried their figures are evaluated again from the stored input. */
export const isCurrentResultShape = (result: BalanceResult | null): result is BalanceResult =>
  result !== null && result.flags.every((f) => "figures" in f);
