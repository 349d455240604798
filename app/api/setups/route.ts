import { listSetupsForOwner } from "@/db/queries/setups";
import { requireApiViewer } from "@/lib/auth/guard";

/** GET /api/setups — the signed-in person's own setups. */
export async function GET() {
  const access = await requireApiViewer();
  if (!access.ok) return access.response;
  const setups = await listSetupsForOwner({ ownerId: access.viewer.id });
  return Response.json({ setups });
}
