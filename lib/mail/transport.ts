import "server-only";
import { createTransport, type SMTPTransportOptions } from "nodemailer";
import { mailFrom, mailRoute, type MailRoute } from "./config";

/** One message as the outbox holds it. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html: string;
}

/** Hands one message to an SMTP server; resolves once the server accepted it, rejects otherwise. */
export type MailSender = (message: MailMessage) => Promise<void>;

// Bounded waits, well inside the outbox's claim lease (lib/mail/deliver.ts), so a hung server
// cannot hold a claimed row past its lease and let a second process send it again.
const TIMEOUTS = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 } as const;

/** nodemailer's options for a route; null when there is nowhere to send. */
export function smtpOptionsFor(route: MailRoute): SMTPTransportOptions | null {
  if (route.kind === "smtp") return { ...TIMEOUTS, url: route.url };
  // The fake speaks plain SMTP on loopback and refuses STARTTLS: no TLS, for the fake only.
  if (route.kind === "fake") return { ...TIMEOUTS, host: route.host, port: route.port, secure: false, ignoreTLS: true };
  return null;
}

/** A sender over SMTP for `route` (defaults to the environment's), or null when mail is not configured. */
export function createMailSender(route: MailRoute = mailRoute(), from: string = mailFrom()): MailSender | null {
  const options = smtpOptionsFor(route);
  if (!options) return null;
  const transport = createTransport(options, { from });
  return async ({ to, subject, text, html }) => {
    const info = await transport.sendMail({ to, subject, text, html });
    // A server may accept the transaction yet refuse the one recipient; that is a failed send.
    if (info.rejected.length > 0) throw new Error(`recipient refused: ${info.rejected.join(", ")}`);
  };
}
