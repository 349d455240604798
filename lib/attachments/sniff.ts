import "server-only";
import { fileTypeFromBuffer } from "file-type";
import { isAttachmentContentType, type AttachmentContentType } from "@/lib/domain";

/** How much of a file's start is read to tell its type: file-type's own "reasonable detection size". */
export const SNIFF_BYTES = 4100;

export interface Sniffed {
  /** The accepted type the content is, or null. */
  contentType: AttachmentContentType | null;
  /** What the content looked like, for the message when it is refused (null: nothing known, e.g. text or HTML). */
  detected: string | null;
}

/** The file's type from its first bytes alone: its name and the browser's claim are never asked. */
export async function sniffAttachmentType(head: Uint8Array): Promise<Sniffed> {
  const found = await fileTypeFromBuffer(head);
  // An animated PNG is a PNG whose first frame every PNG reader shows.
  const mime = found?.mime === "image/apng" ? "image/png" : (found?.mime ?? null);
  return { contentType: isAttachmentContentType(mime) ? mime : null, detected: mime };
}
