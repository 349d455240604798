import type { NextConfig } from "next";

const nextConfig: NextConfig = {
  reactStrictMode: true,
  poweredByHeader: false,
  // Lets pages answer another role with forbidden() and the 403 page.
  experimental: { authInterrupts: true },
};

export default nextConfig;
