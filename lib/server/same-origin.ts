import "server-only";
import type { AppError } from "@/lib/errors";

const SAFE_METHODS = new Set(["GET", "HEAD", "OPTIONS"]);

/** The app's own origin, from the public URL it is configured with (never from the request's Host). */
function appOrigin(): string | null {
  const configured = process.env.BETTER_AUTH_URL;
  if (!configured) return null;
  try {
    return new URL(configured).origin;
  } catch {
    return null;
  }
}

/**
 * Refuses a state-changing request that a browser sent from another site. Browsers send `Origin`
 * on every cross-site POST, PUT and DELETE (and `Sec-Fetch-Site`); a request with neither comes
 * from a script or a CLI, which no page can make a signed-in person send.
 */
export function crossSiteRefusal(request: Request): AppError | null {
  if (SAFE_METHODS.has(request.method)) return null;
  const refused: AppError = { code: "forbidden", message: "Requests from other sites are refused." };
  // Either header saying "another site" is enough to refuse.
  const site = request.headers.get("sec-fetch-site");
  if (site !== null && site !== "same-origin" && site !== "none") return refused;
  const origin = request.headers.get("origin");
  const expected = appOrigin() ?? new URL(request.url).origin;
  return origin !== null && origin !== expected ? refused : null;
}
