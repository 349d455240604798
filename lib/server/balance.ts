import "server-only";
import { evaluateBalance, type BalanceInput, type BalanceResult } from "@/lib/balance";
import { ok, type Result } from "@/lib/errors";

/** One balance evaluation of a validated input; a mount off the rail is a flag in the result, not an error. */
export async function evaluateInput({ input }: { input: BalanceInput }): Promise<Result<BalanceResult>> {
  return ok(evaluateBalance(input));
}
