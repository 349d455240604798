import { defineConfig } from "vitest/config";

// Two projects: `unit` is fast and needs nothing outside the process (engine, db on a temp file);
// `e2e` builds the app once, serves it on a free port with its own database, and drives it over
// HTTP (tests/api) and through Debian's Chromium (tests/browser).
export default defineConfig({
  resolve: {
    tsconfigPaths: true,
    // "server-only" throws outside React's server build; in tests the server modules run in Node.
    alias: { "server-only": new URL("./tests/support/server-only-stub.ts", import.meta.url).pathname },
  },
  test: {
    projects: [
      {
        extends: true,
        test: {
          name: "unit",
          include: ["tests/unit/**/*.test.ts"],
          environment: "node",
          // A few unit tests spawn the CLI scripts (tsx starts in seconds on a busy machine).
          testTimeout: 30_000,
        },
      },
      {
        extends: true,
        test: {
          name: "e2e",
          include: ["tests/api/**/*.test.ts", "tests/browser/**/*.test.ts"],
          environment: "node",
          globalSetup: ["tests/support/global-setup.ts"],
          testTimeout: 60_000,
          hookTimeout: 120_000,
          fileParallelism: false,
        },
      },
    ],
  },
});
