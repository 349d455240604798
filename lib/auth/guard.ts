import "server-only";
import { headers } from "next/headers";
import { forbidden, redirect } from "next/navigation";
import { ROLES, UNIT_SYSTEMS, type Role } from "@/lib/domain";
import { fail, errorResponse, type Result } from "@/lib/errors";
import { checkAccess, type Viewer } from "./access";
import { auth } from "./server";

function asRole(value: unknown): Role {
  return (ROLES as readonly unknown[]).includes(value) ? (value as Role) : "customer";
}

/** The signed-in person for this request, or null. Reads the session from the database every time. */
export async function getViewer(): Promise<Viewer | null> {
  const session = await auth.api.getSession({ headers: await headers() });
  if (!session) return null;
  const u = session.user as typeof session.user & { role?: unknown; unitSystem?: unknown };
  return {
    id: u.id,
    name: u.name,
    email: u.email,
    role: asRole(u.role),
    unitSystem: (UNIT_SYSTEMS as readonly unknown[]).includes(u.unitSystem) ? (u.unitSystem as Viewer["unitSystem"]) : "metric",
  };
}

/** For pages: sends strangers to sign-in and answers other roles with the 403 page. */
export async function requirePageViewer(allowedRoles?: readonly Role[], returnTo?: string): Promise<Viewer> {
  const viewer = await getViewer();
  const verdict = checkAccess(viewer, allowedRoles);
  if (verdict === "unauthenticated") redirect(returnTo ? `/sign-in?next=${encodeURIComponent(returnTo)}` : "/sign-in");
  if (verdict === "forbidden") forbidden();
  return viewer as Viewer;
}

/** For route handlers: a ready 401/403 response, or the viewer. */
export async function requireApiViewer(
  allowedRoles?: readonly Role[],
): Promise<{ ok: true; viewer: Viewer } | { ok: false; response: Response }> {
  const result = await requireActionViewer(allowedRoles);
  return result.ok ? { ok: true, viewer: result.data } : { ok: false, response: errorResponse(result.error) };
}

/** For server actions: a typed failure instead of a redirect, so forms can show it. */
export async function requireActionViewer(allowedRoles?: readonly Role[]): Promise<Result<Viewer>> {
  const viewer = await getViewer();
  const verdict = checkAccess(viewer, allowedRoles);
  if (verdict === "unauthenticated") return fail("unauthenticated", "Sign in to continue.");
  if (verdict === "forbidden") return fail("forbidden", "Your role does not allow this.");
  return { ok: true, data: viewer as Viewer };
}
