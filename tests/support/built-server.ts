import { spawn, spawnSync } from "node:child_process";
import { randomBytes } from "node:crypto";
import { nextCommand } from "../../scripts/next-bin";
import { freePort, TEST_DIST_DIR } from "./app-server";

// One more `next start` of the tests' build, on a database the test chose, with its output kept:
// for checking what the server does at start-up and while serving, apart from the suite's server.

export interface BuiltServer {
  baseURL: string;
  /** Resolves with the exit code once the server process ends (null when a signal ended it). */
  exited: Promise<number | null>;
  stdout: () => string;
  stderr: () => string;
  stop: () => void;
}

export async function startBuiltServer(databaseUrl: string): Promise<BuiltServer> {
  const port = await freePort();
  const baseURL = `http://127.0.0.1:${port}`;
  const inherited = { ...process.env };
  // Mail and files have nowhere to go: this server needs neither to start or to report its health.
  for (const name of Object.keys(inherited))
    if (/^(SMTP_URL|S3_|TRIMRAIL_SMTP_FAKE_PORT|TRIMRAIL_MAIL_DIR)/.test(name)) delete inherited[name];
  const child = spawn(...nextCommand(["start", "-p", String(port), "-H", "127.0.0.1"]), {
    env: {
      ...inherited,
      NODE_ENV: "production",
      DATABASE_URL: databaseUrl,
      BETTER_AUTH_SECRET: randomBytes(32).toString("base64url"),
      BETTER_AUTH_URL: baseURL,
      NEXT_TELEMETRY_DISABLED: "1",
      TRIMRAIL_DIST_DIR: TEST_DIST_DIR,
    },
    stdio: ["ignore", "pipe", "pipe"],
    detached: true,
  });
  let out = "";
  let err = "";
  child.stdout.setEncoding("utf8").on("data", (text: string) => (out += text));
  child.stderr.setEncoding("utf8").on("data", (text: string) => (err += text));
  const exited = new Promise<number | null>((resolve) => child.once("exit", (code) => resolve(code)));
  return {
    baseURL,
    exited,
    stdout: () => out,
    stderr: () => err,
    stop: () => {
      try {
        if (child.pid) process.kill(-child.pid, "SIGTERM");
      } catch {
        // already gone
      }
    },
  };
}

/** The exit code, or "still running" when the process has not ended within `ms`. */
export async function exitWithin(server: BuiltServer, ms: number): Promise<number | null | "still running"> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<"still running">((resolve) => (timer = setTimeout(() => resolve("still running"), ms)));
  const outcome = await Promise.race([server.exited, timeout]);
  clearTimeout(timer);
  return outcome;
}

/** Polls `path` until it answers (any status); throws when the server exits or `ms` pass first. */
export async function waitForAnswer(server: BuiltServer, path: string, ms: number): Promise<Response> {
  const deadline = Date.now() + ms;
  let gone = false;
  void server.exited.then(() => (gone = true));
  while (Date.now() < deadline && !gone) {
    try {
      return await fetch(`${server.baseURL}${path}`);
    } catch {
      await new Promise((r) => setTimeout(r, 250));
    }
  }
  throw new Error(`the server did not answer ${path} (${gone ? "it exited" : "time ran out"}): ${server.stderr()}`);
}

/** Makes a file unwritable even for root (the tests run as root): the immutable attribute. */
export function setImmutable(file: string, on: boolean): void {
  const result = spawnSync("chattr", [on ? "+i" : "-i", file], { encoding: "utf8" });
  if (result.status !== 0) throw new Error(`chattr failed: ${result.stderr}`);
}
