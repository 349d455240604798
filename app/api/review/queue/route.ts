import { listReviewQueue } from "@/db/queries/setups";
import { STAFF_ROLES } from "@/lib/domain";
import { requireApiViewer } from "@/lib/auth/guard";

/** GET /api/review/queue — submitted setups from every customer; support and maker only. */
export async function GET() {
  const access = await requireApiViewer(STAFF_ROLES);
  if (!access.ok) return access.response;
  return Response.json({ setups: await listReviewQueue() });
}
