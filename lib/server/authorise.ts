import "server-only";
import { checkAccess, type Viewer } from "@/lib/auth/access";
import type { Role } from "@/lib/domain";
import { fail, type Result } from "@/lib/errors";

/** The session and role step every wrapper runs: a typed 401/403, or the viewer. */
export function authorise(viewer: Viewer | null, roles?: readonly Role[]): Result<Viewer> {
  const verdict = checkAccess(viewer, roles);
  if (verdict === "unauthenticated") return fail("unauthenticated", "Sign in to continue.");
  if (verdict === "forbidden") return fail("forbidden", "Your role does not allow this.");
  return { ok: true, data: viewer as Viewer };
}
