import type { NextConfig } from "next";
import { SECURITY_HEADERS } from "./security-headers";

const nextConfig: NextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // The tests build into their own folder (.next-test) so a running `npm run demo`, which serves
  // from .next, keeps its files while `npm test` builds.
  distDir: process.env.TRIMRAIL_DIST_DIR || ".next",
  // Lets pages answer another role with forbidden() and the 403 page.
  experimental: { authInterrupts: true },
  async headers() {
    return [{ source: "/:path*", headers: SECURITY_HEADERS }];
  },
};

export default nextConfig;
