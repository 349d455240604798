import "server-only";
import * as setupsDb from "@/db/queries/setups";
import { ok, type Result } from "@/lib/errors";

/** The review desk's queue: submitted setups from every customer, oldest first (staff only, by the route's roles). */
export async function listReviewQueue(): Promise<Result<{ setups: setupsDb.SetupListItem[] }>> {
  return ok({ setups: await setupsDb.listReviewQueue() });
}
