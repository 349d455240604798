import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { randomBytes } from "node:crypto";
import { mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import os from "node:os";
import path from "node:path";
import { openDatabase } from "../../db/index";
import { migrateDatabase } from "../../db/migrate";
import { seedDemo } from "../../db/seed";
import { nextCommand } from "../../scripts/next-bin";
import { startS3Fake } from "../../scripts/s3-fake";
import { startSmtpFake } from "../../scripts/smtp-fake";

/**
 * The tests' own build folder (next.config.ts reads TRIMRAIL_DIST_DIR): building here leaves a
 * running `npm run demo`, which serves .next, untouched.
 */
export const TEST_DIST_DIR = ".next-test";

export interface AppServer {
  baseURL: string;
  databaseUrl: string;
  /** Where the app's own SMTP fake keeps every message it sends, as .eml files. */
  mailDir: string;
  /** The S3_* variables of the app's own S3 fake (its attachments' store), for tests to look inside it. */
  s3Env: Record<string, string>;
  /** The spawned `next start` (leader of its own process group, with the server's processes under it). */
  serverPid: number;
  stop: () => Promise<void>;
}

export async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once("error", reject);
    server.listen(0, "127.0.0.1", () => {
      const address = server.address();
      const port = typeof address === "object" && address ? address.port : 0;
      server.close(() => resolve(port));
    });
  });
}

async function waitForServer(url: string, child: ChildProcess, timeoutMs: number): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`next start exited with ${child.exitCode}`);
    try {
      const response = await fetch(url);
      if (response.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`server at ${url} did not answer within ${timeoutMs} ms`);
}

/**
 * A private copy of the app: a fresh SQLite file with migrations and demo data, a production build
 * (`next build` into TEST_DIST_DIR unless `build` is false) and `next start` on a free port of the
 * loopback address.
 */
export async function startAppServer({
  build,
  databaseUrl: existingDatabaseUrl,
  env: extraEnv = {},
}: {
  build: boolean;
  databaseUrl?: string;
  /** More variables for the server, e.g. the sign-in limit's figures for a test of its own. */
  env?: Record<string, string>;
}): Promise<AppServer> {
  const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-app-"));
  // A benchmark brings its own (large) database; the tests get a fresh one with the demo.
  const databaseUrl = existingDatabaseUrl ?? `file:${path.join(dir, "app.db")}`;
  const { db, client } = openDatabase(databaseUrl);
  await migrateDatabase(db);
  if (!existingDatabaseUrl) await seedDemo(db);
  client.close();

  // The app's mail goes to a fake of its own on loopback, never to a server in SMTP_URL.
  const mail = await startSmtpFake({ dir: path.join(dir, "mail") });
  // Its attachments go to an S3 fake of its own on loopback, never to a bucket named in S3_*.
  const s3 = await startS3Fake({ dir: path.join(dir, "s3") });
  const inherited = { ...process.env };
  delete inherited.SMTP_URL;

  const port = await freePort();
  const baseURL = `http://127.0.0.1:${port}`;
  const env = {
    ...inherited,
    TRIMRAIL_SMTP_FAKE_PORT: String(mail.port),
    TRIMRAIL_MAIL_DIR: mail.dir,
    ...s3.env,
    NODE_ENV: "production" as const,
    DATABASE_URL: databaseUrl,
    BETTER_AUTH_SECRET: randomBytes(32).toString("base64url"),
    BETTER_AUTH_URL: baseURL,
    NEXT_TELEMETRY_DISABLED: "1",
    TRIMRAIL_DIST_DIR: TEST_DIST_DIR,
    ...extraEnv,
  };

  if (build) {
    const result = spawnSync(...nextCommand(["build"]), { stdio: "inherit", env });
    if (result.status !== 0) throw new Error(`next build failed with ${result.status}`);
  }

  const server = spawn(...nextCommand(["start", "-p", String(port), "-H", "127.0.0.1"]), {
    env,
    stdio: ["ignore", "inherit", "inherit"],
    detached: true,
  });
  await waitForServer(`${baseURL}/sign-in`, server, 60_000);

  return {
    baseURL,
    databaseUrl,
    mailDir: mail.dir,
    s3Env: s3.env,
    serverPid: server.pid ?? 0,
    stop: async () => {
      if (server.pid) {
        try {
          process.kill(-server.pid, "SIGTERM");
        } catch {
          // already gone
        }
      }
      await mail.stop();
      await s3.stop();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
