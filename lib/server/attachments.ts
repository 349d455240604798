import "server-only";
import { randomUUID } from "node:crypto";
import { createReadStream } from "node:fs";
import { readFile } from "node:fs/promises";
import * as attachmentsDb from "@/db/queries/attachments";
import { getSetupHeaderForViewer, type SetupHeader } from "@/db/queries/review";
import type { AttachmentRow } from "@/db/schema";
import { prepareImage, THUMBNAIL_CONTENT_TYPE } from "@/lib/attachments/images";
import { SNIFF_BYTES, sniffAttachmentType } from "@/lib/attachments/sniff";
import type { Viewer } from "@/lib/auth/access";
import {
  ATTACHMENT_MAX_BYTES,
  ATTACHMENT_NAME_MAX_LENGTH,
  ATTACHMENTS_PER_SETUP_MAX,
  attachmentKind,
  isAttachmentContentType,
  type AttachmentContentType,
  type AttachmentView,
} from "@/lib/domain";
import { fail, ok, type AppError, type Result } from "@/lib/errors";
import { receiveSingleFile, type ReceivedFile } from "@/lib/http/multipart-file";
import { getObjectStore, type ObjectStore } from "@/lib/storage/object-store";
import type { FileBody } from "./route";

export type { AttachmentView };
import { SETUP_NOT_FOUND } from "./setups";

// Photos and datasheets of a setup. The same rule as the setup itself: its owner adds and deletes;
// review staff read once it has been submitted (getSetupHeaderForViewer); anyone else finds nothing.
// Bytes live in the object store under a random key, the row in the database; the functions here
// keep the two in step (an object whose row could not be written is deleted again).

export const ATTACHMENT_NOT_FOUND = "No such file among the setups you can see.";

/** Where a photo's thumbnail is kept: beside the photo, under a key made from its own. */
export const thumbnailKeyFor = (storageKey: string) => `${storageKey}.thumb.webp`;

const newStorageKey = () => `attachments/${randomUUID()}`;

function toView(row: AttachmentRow): AttachmentView {
  const contentType = isAttachmentContentType(row.contentType) ? row.contentType : "application/pdf";
  const kind = attachmentKind(contentType);
  const url = `/api/attachments/${encodeURIComponent(row.id)}`;
  return {
    id: row.id,
    setupId: row.setupId,
    fileName: row.fileName,
    contentType,
    kind,
    sizeBytes: row.sizeBytes,
    createdAt: row.createdAt.toISOString(),
    url,
    thumbnailUrl: kind === "image" ? `${url}/thumbnail` : null,
  };
}

const storeMissing = () => fail("unavailable", "Attachments are not set up on this server: no file store is configured (S3_BUCKET).");
const storeDown = (error: unknown, doing: string) => {
  console.error(`[attachments] the file store failed while ${doing}`, error);
  return fail("unavailable", "The file store did not answer; nothing was changed. Try again in a moment.");
};

/** A setup as this viewer may read it, or 404. */
async function readableSetup(viewer: Viewer, setupId: string): Promise<Result<SetupHeader>> {
  const header = await getSetupHeaderForViewer({ id: setupId, viewer });
  return header ? ok(header) : fail("not_found", SETUP_NOT_FOUND);
}

/** A setup this viewer may change the files of: their own. Staff who may read it hear 403; anyone else 404. */
async function ownSetup(viewer: Viewer, setupId: string, notFound: () => { ok: false; error: AppError }): Promise<Result<SetupHeader>> {
  const header = await getSetupHeaderForViewer({ id: setupId, viewer });
  if (!header) return notFound();
  if (header.ownerId !== viewer.id) return fail("forbidden", "Only the customer who owns this setup can add or delete its files.");
  return ok(header);
}

/** An attachment and its setup as this viewer may read them, or 404 (the same answer as for no such file). */
async function readableAttachment(viewer: Viewer, id: string): Promise<Result<AttachmentRow>> {
  const row = await attachmentsDb.getAttachmentById({ id });
  if (!row || !(await getSetupHeaderForViewer({ id: row.setupId, viewer }))) return fail("not_found", ATTACHMENT_NOT_FOUND);
  return ok(row);
}

export async function listAttachments({
  viewer,
  setupId,
}: {
  viewer: Viewer;
  setupId: string;
}): Promise<Result<{ attachments: AttachmentView[] }>> {
  const setup = await readableSetup(viewer, setupId);
  if (!setup.ok) return setup;
  return ok({ attachments: (await attachmentsDb.listAttachmentsForSetup({ setupId })).map(toView) });
}

/** The name kept for display: the last path segment, printable characters only, not too long. */
export function displayFileName(given: string): string {
  const base = given.split(/[\\/]/).pop() ?? "";
  const clean = base
    .replace(/[\u0000-\u001f\u007f]+/g, "")
    .replace(/\s+/g, " ")
    .trim();
  return clean.slice(-ATTACHMENT_NAME_MAX_LENGTH) || "attachment";
}

const TOO_LARGE = `A file may be at most ${ATTACHMENT_MAX_BYTES / (1024 * 1024)} MB.`;
const FULL = `A setup holds at most ${ATTACHMENTS_PER_SETUP_MAX} files; delete one before adding another.`;

async function checkHead(head: Uint8Array): Promise<Result<AttachmentContentType>> {
  const { contentType, detected } = await sniffAttachmentType(head);
  if (contentType) return ok(contentType);
  const what = detected ? `its content is ${detected}` : "its content is not a format we know (text or HTML, perhaps)";
  return fail(
    "unsupported_media_type",
    `Only photos (JPEG, PNG, WebP) and PDF datasheets can be attached: ${what}, whatever its name says.`,
  );
}

interface StoredObject {
  key: string;
  /** The bytes, or the temporary file to stream them from. */
  body: Uint8Array | { path: string };
  sizeBytes: number;
  contentType: string;
}

/** What goes into the store for a received file: the cleaned photo and its thumbnail, or the PDF as it came. */
async function objectsFor(file: ReceivedFile, contentType: AttachmentContentType, storageKey: string): Promise<Result<StoredObject[]>> {
  if (attachmentKind(contentType) === "pdf") {
    return ok([{ key: storageKey, body: { path: file.path }, sizeBytes: file.sizeBytes, contentType }]);
  }
  const image = await prepareImage(await readFile(file.path), contentType);
  if (!image) return fail("unsupported_media_type", "This file starts like a photo but could not be read as one; it may be damaged.");
  return ok([
    { key: storageKey, body: image.bytes, sizeBytes: image.bytes.byteLength, contentType },
    { key: thumbnailKeyFor(storageKey), body: image.thumbnail, sizeBytes: image.thumbnail.byteLength, contentType: THUMBNAIL_CONTENT_TYPE },
  ]);
}

/** Deletes objects, logging (not throwing) each failure: used where the rows are already gone or never came. */
async function deleteObjectsQuietly(store: ObjectStore, keys: string[], why: string): Promise<void> {
  await Promise.all(
    keys.map((key) =>
      store
        .delete(key)
        .catch((error: unknown) => console.error(`[attachments] could not delete object ${key} (${why}); it is left in the store`, error)),
    ),
  );
}

/**
 * Takes one file from a multipart body (POST /api/setups/:id/attachments). Refuses before reading
 * when the setup is not the viewer's or already full; while streaming when the file passes 10 MB
 * (413) or its first bytes are not an accepted type (415). Writes the objects, then the row; if
 * the row cannot be written the objects are deleted again.
 */
export async function addAttachment({
  viewer,
  setupId,
  request,
}: {
  viewer: Viewer;
  setupId: string;
  request: Request;
}): Promise<Result<AttachmentView>> {
  const store = getObjectStore();
  if (!store) return storeMissing();
  const setup = await ownSetup(viewer, setupId, () => fail("not_found", SETUP_NOT_FOUND));
  if (!setup.ok) return setup;
  if ((await attachmentsDb.countAttachmentsForSetup({ setupId })) >= ATTACHMENTS_PER_SETUP_MAX) return fail("conflict", FULL);

  return receiveSingleFile(
    request,
    { maxBytes: ATTACHMENT_MAX_BYTES, headBytes: SNIFF_BYTES, checkHead, tooLargeMessage: TOO_LARGE },
    async (file, contentType) => {
      const storageKey = newStorageKey();
      const objects = await objectsFor(file, contentType, storageKey);
      if (!objects.ok) return objects;
      const written: string[] = [];
      try {
        for (const object of objects.data) {
          const body = object.body instanceof Uint8Array ? object.body : createReadStream(object.body.path);
          await store.put({ key: object.key, body, sizeBytes: object.sizeBytes, contentType: object.contentType });
          written.push(object.key);
        }
      } catch (error) {
        await deleteObjectsQuietly(store, written, "an upload failed part-way");
        return storeDown(error, "storing an upload");
      }
      let outcome: attachmentsDb.InsertAttachmentOutcome;
      try {
        outcome = await attachmentsDb.insertAttachment({
          row: {
            id: randomUUID(),
            setupId,
            uploaderId: viewer.id,
            fileName: displayFileName(file.fileName),
            contentType,
            sizeBytes: objects.data[0].sizeBytes,
            storageKey,
          },
          cap: ATTACHMENTS_PER_SETUP_MAX,
        });
      } catch (error) {
        await deleteObjectsQuietly(store, written, "its row could not be written");
        throw error;
      }
      if (outcome.kind === "inserted") return ok(toView(outcome.row));
      await deleteObjectsQuietly(store, written, "its row was refused");
      return outcome.kind === "full" ? fail("conflict", FULL) : fail("not_found", SETUP_NOT_FOUND);
    },
  );
}

async function fileFrom(
  store: ObjectStore,
  key: string,
  what: string,
): Promise<Result<{ body: ReadableStream<Uint8Array>; sizeBytes: number | null }>> {
  try {
    const object = await store.get(key);
    if (object) return ok(object);
    console.error(`[attachments] the object ${key} of ${what} is missing from the store`);
    return fail("not_found", "This file is missing from the file store.");
  } catch (error) {
    return storeDown(error, `reading ${what}`);
  }
}

/** Objects never change under their key, so the browser may keep them; only the people who can see the setup get the address. */
const KEEP_PRIVATELY = "private, max-age=86400, immutable";

/** The file's bytes (GET /api/attachments/:id): shown inline when a photo, downloaded when a PDF. */
export async function getAttachmentFile({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<FileBody>> {
  const store = getObjectStore();
  if (!store) return storeMissing();
  const row = await readableAttachment(viewer, id);
  if (!row.ok) return row;
  const file = await fileFrom(store, row.data.storageKey, `attachment ${id}`);
  if (!file.ok) return file;
  const { contentType, fileName } = toView(row.data);
  return ok({
    bytes: file.data.body,
    sizeBytes: file.data.sizeBytes,
    contentType,
    fileName,
    disposition: contentType === "application/pdf" ? "attachment" : "inline",
    cacheControl: KEEP_PRIVATELY,
  });
}

/** A photo's thumbnail (GET /api/attachments/:id/thumbnail); a PDF has none (404). */
export async function getAttachmentThumbnail({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<FileBody>> {
  const store = getObjectStore();
  if (!store) return storeMissing();
  const row = await readableAttachment(viewer, id);
  if (!row.ok) return row;
  if (toView(row.data).kind !== "image") return fail("not_found", "A PDF has no thumbnail; open the file itself.");
  const file = await fileFrom(store, thumbnailKeyFor(row.data.storageKey), `the thumbnail of attachment ${id}`);
  if (!file.ok) return file;
  const name = `${row.data.fileName.replace(/\.[^.]*$/, "")}-thumbnail.webp`;
  return ok({
    bytes: file.data.body,
    sizeBytes: file.data.sizeBytes,
    contentType: THUMBNAIL_CONTENT_TYPE,
    fileName: name,
    disposition: "inline",
    cacheControl: KEEP_PRIVATELY,
  });
}

/**
 * Deletes a file (DELETE /api/attachments/:id): its objects first, then its row. If the store
 * fails nothing is deleted and the owner can try again; deleting an absent object succeeds, so a
 * retry after a half-finished attempt completes it.
 */
export async function deleteAttachment({ viewer, id }: { viewer: Viewer; id: string }): Promise<Result<null>> {
  const store = getObjectStore();
  if (!store) return storeMissing();
  const row = await attachmentsDb.getAttachmentById({ id });
  if (!row) return fail("not_found", ATTACHMENT_NOT_FOUND);
  const setup = await ownSetup(viewer, row.setupId, () => fail("not_found", ATTACHMENT_NOT_FOUND));
  if (!setup.ok) return setup;
  try {
    await Promise.all([store.delete(row.storageKey), store.delete(thumbnailKeyFor(row.storageKey))]);
  } catch (error) {
    return storeDown(error, `deleting attachment ${id}`);
  }
  return (await attachmentsDb.deleteAttachment({ id, ownerId: viewer.id })) ? ok(null) : fail("not_found", ATTACHMENT_NOT_FOUND);
}

/** After a setup's rows are deleted and committed: its files' objects go too. A failure is logged and the rest carry on. */
export async function deleteStoredAttachmentObjects(storageKeys: string[]): Promise<void> {
  if (storageKeys.length === 0) return;
  const store = getObjectStore();
  if (!store) {
    console.error(`[attachments] no file store is configured; ${storageKeys.length} deleted attachment(s) are left in the old one`);
    return;
  }
  await deleteObjectsQuietly(
    store,
    storageKeys.flatMap((key) => [key, thumbnailKeyFor(key)]),
    "its setup was deleted",
  );
}
