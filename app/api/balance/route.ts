import { balanceInputSchema } from "@/lib/balance";
import { evaluateInput } from "@/lib/server/balance";
import { route } from "@/lib/server/route";

/** POST /api/balance — evaluate one BalanceInput; signed-in users. A mount off the rail is a flag, not a 400. */
export const POST = route({ body: balanceInputSchema }, ({ body }) => evaluateInput({ input: body }));
