import "server-only";
import { readdir, readFile } from "node:fs/promises";
import path from "node:path";
import { simpleParser, type AddressObject } from "mailparser";
import { CAPTURED_MAIL_EXT, CAPTURED_MAIL_ID, capturedMailId } from "./captured-file";

// Reads what the local SMTP fake kept (scripts/smtp-fake.ts) for /dev/mail and the tests.
// Only names that the fake writes are ever opened, so an id from a URL cannot reach another file.

export interface CapturedMailSummary {
  id: string;
  /** When the fake received it (from the file name). */
  receivedAt: Date;
  from: string;
  to: string;
  subject: string;
}

export interface CapturedMail extends CapturedMailSummary {
  text: string;
  /** The HTML part, or null when the message has none. */
  html: string | null;
}

const addresses = (value: AddressObject | AddressObject[] | undefined): string =>
  (Array.isArray(value) ? value : value ? [value] : []).map((a) => a.text).join(", ");

async function keptIds(dir: string): Promise<string[]> {
  try {
    return (await readdir(dir)).map(capturedMailId).filter((id): id is string => id !== null);
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code === "ENOENT") return []; // nothing received yet
    throw error;
  }
}

async function parseKept(dir: string, id: string): Promise<CapturedMail> {
  const parsed = await simpleParser(await readFile(path.join(dir, `${id}${CAPTURED_MAIL_EXT}`)));
  return {
    id,
    receivedAt: new Date(Number(id.slice(0, id.indexOf("-")))),
    from: addresses(parsed.from),
    to: addresses(parsed.to),
    subject: parsed.subject ?? "(no subject)",
    text: parsed.text ?? "",
    html: parsed.html || null,
  };
}

/** The newest `limit` messages first. */
export async function listCapturedMail({ dir, limit = 200 }: { dir: string; limit?: number }): Promise<CapturedMail[]> {
  const ids = (await keptIds(dir)).sort().reverse().slice(0, limit);
  return Promise.all(ids.map((id) => parseKept(dir, id)));
}

/** One message by id, or null when the id is malformed or no such message was kept. */
export async function readCapturedMail({ dir, id }: { dir: string; id: string }): Promise<CapturedMail | null> {
  if (!CAPTURED_MAIL_ID.test(id)) return null;
  if (!(await keptIds(dir)).includes(id)) return null;
  return parseKept(dir, id);
}
