// How the local SMTP fake names the messages it keeps, and the only names /dev/mail will open.
// Pure, so the fake (scripts/smtp-fake.ts) and the pages share one rule.

/** Milliseconds since 1970 (13 digits), a dash, 8 hex digits: sorts by arrival, no path characters. */
export const CAPTURED_MAIL_ID = /^\d{13}-[0-9a-f]{8}$/;
export const CAPTURED_MAIL_EXT = ".eml";

export function capturedMailFileName(receivedAt: Date, randomHex: string): string {
  return `${String(receivedAt.getTime()).padStart(13, "0")}-${randomHex}${CAPTURED_MAIL_EXT}`;
}

/** The id of a kept message's file name, or null for any other file (temporary files, strays). */
export function capturedMailId(fileName: string): string | null {
  if (!fileName.endsWith(CAPTURED_MAIL_EXT)) return null;
  const id = fileName.slice(0, -CAPTURED_MAIL_EXT.length);
  return CAPTURED_MAIL_ID.test(id) ? id : null;
}
