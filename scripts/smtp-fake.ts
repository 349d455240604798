import { randomBytes } from "node:crypto";
import { mkdir, rename, writeFile } from "node:fs/promises";
import path from "node:path";
import { pathToFileURL } from "node:url";
import { SMTPServer } from "smtp-server";
import { capturedMailFileName } from "../lib/mail/captured-file";

// A local SMTP server for dev, demo and tests: it accepts every message on 127.0.0.1 and keeps it
// as an .eml file, so nothing needs a real mail server or the internet. Read them on /dev/mail.

export interface SmtpFake {
  host: "127.0.0.1";
  port: number;
  dir: string;
  stop: () => Promise<void>;
}

export interface SmtpFakeOptions {
  /** 0 or unset: a free port. */
  port?: number;
  dir: string;
}

/** Starts the fake; resolves once it listens. Messages land in `dir` as `<ms>-<hex>.eml`. */
export async function startSmtpFake({ port = 0, dir }: SmtpFakeOptions): Promise<SmtpFake> {
  const folder = path.resolve(dir);
  await mkdir(folder, { recursive: true });

  const server = new SMTPServer({
    // Plain SMTP on loopback only: no TLS to negotiate (the transport sets ignoreTLS for the fake),
    // and any credentials or none, so a configured user name does not make it refuse mail.
    authOptional: true,
    disabledCommands: ["STARTTLS"],
    logger: false,
    closeTimeout: 1_000,
    onAuth: (_auth, _session, callback) => callback(null, { user: "fake" }),
    onData: (stream, _session, callback) => {
      const chunks: Buffer[] = [];
      stream.on("data", (chunk: Buffer) => chunks.push(chunk));
      stream.on("error", callback);
      stream.on("end", () => {
        const name = capturedMailFileName(new Date(), randomBytes(4).toString("hex"));
        // Written under a temporary name, then renamed: a reader never sees half a message.
        const temporary = path.join(folder, `.${name}.tmp`);
        writeFile(temporary, Buffer.concat(chunks))
          .then(() => rename(temporary, path.join(folder, name)))
          .then(
            () => callback(null, `kept as ${name}`),
            (error: Error) => callback(error),
          );
      });
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, "127.0.0.1", () => {
      server.off("error", reject);
      resolve();
    });
  });
  // After start, a broken connection is the client's problem; log it rather than crash the host.
  server.on("error", (error) => console.error("[smtp-fake]", error.message));
  const address = server.server.address();
  const boundPort = typeof address === "object" && address ? address.port : port;

  return {
    host: "127.0.0.1",
    port: boundPort,
    dir: folder,
    stop: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

function argument(name: string): string | undefined {
  const index = process.argv.indexOf(`--${name}`);
  return index >= 0 ? process.argv[index + 1] : undefined;
}

// CLI: `npx tsx scripts/smtp-fake.ts [--port 2525] [--dir data/mail]`
if (process.argv[1] && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href) {
  const fake = await startSmtpFake({
    port: Number(argument("port") ?? process.env.TRIMRAIL_SMTP_FAKE_PORT ?? 0),
    dir: argument("dir") ?? process.env.TRIMRAIL_MAIL_DIR ?? path.join("data", "mail"),
  });
  console.log(`[smtp-fake] listening on ${fake.host}:${fake.port}, keeping messages in ${fake.dir}`);
  console.log(`[smtp-fake] point the app at it with TRIMRAIL_SMTP_FAKE_PORT=${fake.port} TRIMRAIL_MAIL_DIR=${fake.dir}`);
  for (const signal of ["SIGINT", "SIGTERM"] as const) process.on(signal, () => void fake.stop().then(() => process.exit(0)));
}
