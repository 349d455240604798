import "server-only";
import { forbidden, redirect } from "next/navigation";
import type { Role } from "@/lib/domain";
import { getViewer } from "@/lib/server/viewer";
import { checkAccess, type Viewer } from "./access";

/** For pages: sends strangers to sign-in (with a way back) and answers other roles with the 403 page. */
export async function requirePageViewer(allowedRoles?: readonly Role[], returnTo?: string): Promise<Viewer> {
  const viewer = await getViewer();
  const verdict = checkAccess(viewer, allowedRoles);
  if (verdict === "unauthenticated") redirect(returnTo ? `/sign-in?next=${encodeURIComponent(returnTo)}` : "/sign-in");
  if (verdict === "forbidden") forbidden();
  return viewer as Viewer;
}
