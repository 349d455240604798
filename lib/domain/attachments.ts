// Photos and datasheets hung on a setup: what is accepted and how much. Pure vocabulary, read by
// the server (the caps it enforces) and by the browser (the same caps checked before sending).

/** 10 MB (MiB) per file: enough for a phone photo or a datasheet, small enough to stream through. */
export const ATTACHMENT_MAX_BYTES = 10 * 1024 * 1024;
export const ATTACHMENTS_PER_SETUP_MAX = 20;

/** The kinds accepted, by the type found in the file's content (never its name or the browser's claim). */
export const ATTACHMENT_CONTENT_TYPES = ["image/jpeg", "image/png", "image/webp", "application/pdf"] as const;
export type AttachmentContentType = (typeof ATTACHMENT_CONTENT_TYPES)[number];

export type AttachmentKind = "image" | "pdf";

export const isAttachmentContentType = (value: unknown): value is AttachmentContentType =>
  (ATTACHMENT_CONTENT_TYPES as readonly unknown[]).includes(value);

export const attachmentKind = (contentType: AttachmentContentType): AttachmentKind => (contentType === "application/pdf" ? "pdf" : "image");

/** For the file picker's `accept`: a hint to the picker only; the server decides from the bytes. */
export const ATTACHMENT_ACCEPT = ".jpg,.jpeg,.png,.webp,.pdf,image/jpeg,image/png,image/webp,application/pdf";

/** What the person reads about the accepted files. */
export const ATTACHMENT_RULES_TEXT = "Photos (JPEG, PNG, WebP) and datasheets (PDF), up to 10 MB each and 20 per setup.";

/** The longest file name kept for display; the stored object's key never contains it. */
export const ATTACHMENT_NAME_MAX_LENGTH = 160;

/** An attachment as the API answers it (GET /api/setups/:id/attachments, POST's 201). */
export interface AttachmentView {
  id: string;
  setupId: string;
  fileName: string;
  contentType: AttachmentContentType;
  kind: AttachmentKind;
  sizeBytes: number;
  /** ISO 8601. */
  createdAt: string;
  /** The file itself. */
  url: string;
  /** A small WebP of a photo; null for a PDF. */
  thumbnailUrl: string | null;
}
