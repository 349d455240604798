import path from "node:path";

// Where mail goes, read from the environment each time (tests and scripts set it per process).
// A real server when SMTP_URL is set; else the local fake that `npm run dev`, `npm run demo` and the
// e2e tests start and announce with TRIMRAIL_SMTP_FAKE_PORT; else nowhere yet (rows wait in the outbox).

export const DEFAULT_MAIL_FROM = "Trimrail <no-reply@trimrail.test>";
export const DEFAULT_MAIL_DIR = path.join("data", "mail");

export type MailRoute = { kind: "smtp"; url: string } | { kind: "fake"; host: "127.0.0.1"; port: number; dir: string } | { kind: "none" };

type Env = Record<string, string | undefined>;

export function mailRoute(env: Env = process.env): MailRoute {
  const url = env.SMTP_URL?.trim();
  if (url) return { kind: "smtp", url };
  const port = Number(env.TRIMRAIL_SMTP_FAKE_PORT);
  if (Number.isInteger(port) && port > 0 && port < 65536) {
    // A folder chosen at run time, outside the build: tell Turbopack not to trace it.
    const dir = path.resolve(/*turbopackIgnore: true*/ env.TRIMRAIL_MAIL_DIR?.trim() || DEFAULT_MAIL_DIR);
    return { kind: "fake", host: "127.0.0.1", port, dir };
  }
  return { kind: "none" };
}

export function mailFrom(env: Env = process.env): string {
  return env.MAIL_FROM?.trim() || DEFAULT_MAIL_FROM;
}

/** The fake's folder while the fake is in use, else null (then /dev/mail does not exist). */
export function capturedMailDir(env: Env = process.env): string | null {
  const route = mailRoute(env);
  return route.kind === "fake" ? route.dir : null;
}
