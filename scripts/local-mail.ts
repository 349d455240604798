import path from "node:path";
import { startSmtpFake, type SmtpFake } from "./smtp-fake";

/**
 * For `npm run dev` and `npm run demo`: unless SMTP_URL names a real server, starts the local SMTP
 * fake in this process and puts its port and folder into process.env for the Next server it spawns.
 */
export async function startLocalMail(): Promise<SmtpFake | null> {
  if (process.env.SMTP_URL) {
    console.log("[trimrail] mail goes to the server in SMTP_URL");
    return null;
  }
  const fake = await startSmtpFake({
    port: Number(process.env.TRIMRAIL_SMTP_FAKE_PORT ?? 0),
    dir: process.env.TRIMRAIL_MAIL_DIR ?? path.join("data", "mail"),
  });
  process.env.TRIMRAIL_SMTP_FAKE_PORT = String(fake.port);
  process.env.TRIMRAIL_MAIL_DIR = fake.dir;
  console.log(
    `[trimrail] mail is kept by the local SMTP fake on ${fake.host}:${fake.port} in ${fake.dir} (read it on /dev/mail as the maker)`,
  );
  return fake;
}
