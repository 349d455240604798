import { balanceInputSchema, evaluateBalance } from "@/lib/balance";
import { requireApiViewer } from "@/lib/auth/guard";
import { errorResponse } from "@/lib/errors";
import { readValidBody } from "@/lib/http/read-json-body";

/** POST /api/balance — evaluate one BalanceInput; signed-in users. A mount off the rail is a flag, not a 400. */
export async function POST(request: Request) {
  const access = await requireApiViewer();
  if (!access.ok) return access.response;
  const parsed = await readValidBody(request, balanceInputSchema, "The balance input is not valid.");
  if (!parsed.ok) return errorResponse(parsed.error);
  return Response.json(evaluateBalance(parsed.data));
}
