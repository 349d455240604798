import type { TestProject } from "vitest/node";
import { startAppServer } from "./app-server";

/** The e2e project's world: its own database and server (TRIMRAIL_REUSE_BUILD=1 skips the build). */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  const app = await startAppServer({ build: process.env.TRIMRAIL_REUSE_BUILD !== "1" });
  project.provide("baseURL", app.baseURL);
  project.provide("databaseUrl", app.databaseUrl);
  project.provide("mailDir", app.mailDir);
  project.provide("s3Env", app.s3Env);
  project.provide("serverPid", app.serverPid);
  return app.stop;
}
