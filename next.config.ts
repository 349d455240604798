import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // The tests build into their own folder (.next-test) so a running `npm run demo`, which serves
  // from .next, keeps its files while `npm test` builds.
  distDir: process.env.TRIMRAIL_DIST_DIR || ".next",
  // Lets pages answer another role with forbidden() and the 403 page.
  experimental: { authInterrupts: true },
};

export default nextConfig;
