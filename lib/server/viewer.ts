import "server-only";
import { headers } from "next/headers";
import { cache } from "react";
import { isRole, isUnitSystem } from "@/lib/domain";
import type { Viewer } from "@/lib/auth/access";
import { auth } from "@/lib/auth/server";

/**
 * The signed-in person that a request's headers (its session cookie) name, or null. The session
 * is read from the database every time, without better-auth's cookie cache: a role change or a
 * sign-out must take effect on the next request. Takes the headers as given for the proxy, which
 * reads the viewer from its request for the landing page (lib/auth/signed-in-header.ts).
 */
export async function getViewerFromHeaders(requestHeaders: Headers): Promise<Viewer | null> {
  const session = await auth.api.getSession({ headers: requestHeaders });
  if (!session) return null;
  const u = session.user as typeof session.user & { role?: unknown; unitSystem?: unknown };
  return {
    id: u.id,
    name: u.name,
    email: u.email,
    role: isRole(u.role) ? u.role : "customer",
    unitSystem: isUnitSystem(u.unitSystem) ? u.unitSystem : "metric",
  };
}

/** The viewer of this App Router request, memoised per request (the layout and the page ask once between them). */
export const getViewer = cache(async (): Promise<Viewer | null> => getViewerFromHeaders(await headers()));
