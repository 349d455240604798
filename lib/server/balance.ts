import "server-only";
import {
  evaluateBalance,
  operatingEnvelope,
  type BalanceInput,
  type BalanceResult,
  type OperatingEnvelope,
  type OperatingEnvelopeRequest,
} from "@/lib/balance";
import { ok, type Result } from "@/lib/errors";

/** One balance evaluation of a validated input; a mount off the rail is a flag in the result, not an error. */
export async function evaluateInput({ input }: { input: BalanceInput }): Promise<Result<BalanceResult>> {
  return ok(evaluateBalance(input));
}

/** The operating envelope of a validated setup; a setup without a tether or free lift says why in `reason`. */
export async function operatingEnvelopeOf({ request }: { request: OperatingEnvelopeRequest }): Promise<Result<OperatingEnvelope>> {
  return ok(operatingEnvelope(request.setup, request.options));
}
