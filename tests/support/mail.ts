import { listCapturedMail, type CapturedMail } from "../../lib/mail/captured";

/**
 * Waits until the app's SMTP fake has kept a message to `to` (and matching `subject`) that is not
 * among `except` (ids seen before the action), and returns the newest such message.
 */
export async function waitForMail({
  dir,
  to,
  subject,
  except = [],
  timeoutMs = 20_000,
}: {
  dir: string;
  to: string;
  subject?: RegExp;
  except?: readonly string[];
  timeoutMs?: number;
}): Promise<CapturedMail> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    const found = (await listCapturedMail({ dir })).find(
      (m) => m.to.includes(to) && (!subject || subject.test(m.subject)) && !except.includes(m.id),
    );
    if (found) return found;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`no mail to ${to}${subject ? ` matching ${subject}` : ""} within ${timeoutMs} ms`);
}

/** The ids of every message kept so far: pass as `except` to wait for a newer one. */
export async function keptMailIds(dir: string): Promise<string[]> {
  return (await listCapturedMail({ dir, limit: 10_000 })).map((m) => m.id);
}

/** The first link in a message's text whose path contains `pathPart`. */
export function linkIn(text: string, pathPart: string): URL {
  const url = (text.match(/https?:\/\/[^\s<>"]+/g) ?? []).map((u) => new URL(u)).find((u) => u.pathname.includes(pathPart));
  if (!url) throw new Error(`no link to ${pathPart} in:\n${text}`);
  return url;
}
