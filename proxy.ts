import { getSessionCookie } from "better-auth/cookies";
import { NextResponse, type NextRequest } from "next/server";

// A convenience only: strangers on an app page go to sign-in with a way back. Every page, route and
// action still checks the session and the role on the server (lib/auth/guard.ts).
export function proxy(request: NextRequest): NextResponse {
  if (getSessionCookie(request)) return NextResponse.next();
  const url = request.nextUrl.clone();
  url.pathname = "/sign-in";
  url.search = `?next=${encodeURIComponent(request.nextUrl.pathname + request.nextUrl.search)}`;
  return NextResponse.redirect(url);
}

export const config = {
  matcher: ["/setups/:path*", "/review/:path*", "/workshop/:path*", "/insight/:path*"],
};
