import { getSessionCookie } from "better-auth/cookies";
import { NextResponse, type NextRequest } from "next/server";
import { SIGNED_IN_HEADER } from "@/lib/auth/signed-in-header";
import { getViewerFromHeaders } from "@/lib/server/viewer";

const APP_PAGES = ["/setups", "/review", "/workshop", "/insight", "/dev"];

/** Whether every percent-escape in the path decodes: Next would answer a broken one with a 500. */
function decodes(pathname: string): boolean {
  try {
    for (const segment of pathname.split("/")) decodeURIComponent(segment);
    return true;
  } catch {
    return false;
  }
}

/** The landing page's request, told whether its viewer is signed in (lib/auth/signed-in-header.ts). */
async function withSignedInHeader(request: NextRequest): Promise<NextResponse> {
  const headers = new Headers(request.headers);
  headers.set(SIGNED_IN_HEADER, (await getViewerFromHeaders(request.headers)) ? "1" : "0");
  return NextResponse.next({ request: { headers } });
}

// Conveniences, never the check: a path that cannot be decoded is a plain 404 (nothing can live
// there), strangers on an app page go to sign-in with a way back, and the landing page learns
// which links to offer. Every page and route still checks the session and the role on the server
// (lib/server/route.ts, lib/auth/guard.ts).
export async function proxy(request: NextRequest): Promise<NextResponse> {
  const { pathname } = request.nextUrl;
  if (!decodes(pathname)) {
    return pathname.startsWith("/api/")
      ? NextResponse.json({ error: { code: "not_found", message: "Nothing is at this address." } }, { status: 404 })
      : new NextResponse("Not found: the address is not valid.", { status: 404, headers: { "content-type": "text/plain; charset=utf-8" } });
  }
  if (pathname === "/") return withSignedInHeader(request);
  if (!APP_PAGES.some((prefix) => pathname === prefix || pathname.startsWith(`${prefix}/`))) return NextResponse.next();
  if (getSessionCookie(request)) return NextResponse.next();
  const url = request.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = `?next=${encodeURIComponent(pathname + request.nextUrl.search)}`;
  return NextResponse.redirect(url);
}

export const config = {
  // The landing page, the app's pages, and only those API paths with a percent-escape: a proxy that runs on a route
  // makes Next hold the request body for it, and uploads must stream past it untouched.
  matcher: ["/", "/setups/:path*", "/review/:path*", "/workshop/:path*", "/insight/:path*", "/dev/:path*", "/api/(.*%.*)"],
};
