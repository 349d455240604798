import type { TestProject } from "vitest/node";
import { startAppServer } from "./app-server";

/** The e2e project's world: its own database and server (TRIMRAIL_REUSE_BUILD=1 skips the build). */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  // The tests play the part of a trusted reverse proxy: each simulated person's address arrives as
  // the right-most x-forwarded-for entry (tests/support/http.ts), so per-address limits keep them
  // apart. tests/api/sign-in-limit.test.ts starts a server without it, keyed on the connection.
  const app = await startAppServer({
    build: process.env.TRIMRAIL_REUSE_BUILD !== "1",
    env: { TRIMRAIL_TRUSTED_PROXY_HEADER: "x-forwarded-for" },
  });
  project.provide("baseURL", app.baseURL);
  project.provide("databaseUrl", app.databaseUrl);
  project.provide("mailDir", app.mailDir);
  project.provide("s3Env", app.s3Env);
  project.provide("serverPid", app.serverPid);
  return app.stop;
}
