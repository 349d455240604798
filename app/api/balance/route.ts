import { balanceInputSchema, evaluateBalance } from "@/lib/balance";
import { requireApiViewer } from "@/lib/auth/guard";
import { errorResponse, issuesFromZod } from "@/lib/errors";
import { readJsonBody } from "@/lib/http/read-json-body";

/** POST /api/balance — evaluate one BalanceInput; signed-in users. A mount off the rail is a flag, not a 400. */
export async function POST(request: Request) {
  const access = await requireApiViewer();
  if (!access.ok) return access.response;
  const body = await readJsonBody(request);
  if (!body.ok) return errorResponse(body.error);
  const parsed = balanceInputSchema.safeParse(body.data);
  if (!parsed.success) return errorResponse({ code: "bad_request", message: "The balance input is not valid.", issues: issuesFromZod(parsed.error) });
  return Response.json(evaluateBalance(parsed.data));
}
