import "server-only";
import sharp, { type Metadata } from "sharp";
import type { AttachmentContentType } from "@/lib/domain";
import { stripImageMetadata } from "./strip-metadata";

// What is stored of a photo, and its thumbnail. The photo keeps its pixels; only its metadata goes
// (strip-metadata.ts). A photo turned by an EXIF orientation tag is the exception: without the tag
// it would show on its side, so it is turned for real and re-encoded (sharp keeps no metadata).

/** Side of the square a thumbnail fits in, in pixels (twice the largest tile, for sharp screens). */
export const THUMBNAIL_SIZE_PX = 320;
export const THUMBNAIL_CONTENT_TYPE = "image/webp";

/** A decompression bomb guard: 60 megapixels is more than a phone photo under 10 MB ever has. */
const MAX_INPUT_PIXELS = 60_000_000;

// The server makes one thumbnail at a time per request; libvips' operation cache would only hold memory.
sharp.cache(false);

export interface PreparedImage {
  bytes: Uint8Array;
  thumbnail: Uint8Array;
  /** True when the photo was re-encoded (turned upright, or its structure could not be walked). */
  reencoded: boolean;
}

const open = (bytes: Uint8Array) => sharp(bytes, { limitInputPixels: MAX_INPUT_PIXELS, failOn: "error" });

function reencode(bytes: Uint8Array, contentType: AttachmentContentType): Promise<Buffer> {
  const image = open(bytes).autoOrient();
  if (contentType === "image/png") return image.png().toBuffer();
  if (contentType === "image/webp") return image.webp({ quality: 90 }).toBuffer();
  return image.jpeg({ quality: 90 }).toBuffer();
}

const hasMetadata = (m: Metadata) => Boolean(m.exif || m.xmp || m.iptc || (m.comments && m.comments.length));

/** The photo as it will be stored, and its thumbnail; null when the bytes are not a picture sharp can read. */
export async function prepareImage(bytes: Uint8Array, contentType: AttachmentContentType): Promise<PreparedImage | null> {
  let metadata: Metadata;
  try {
    metadata = await open(bytes).metadata();
  } catch {
    return null;
  }
  try {
    const turned = (metadata.orientation ?? 1) !== 1;
    const stripped = turned ? null : stripImageMetadata(bytes, contentType);
    let stored: Uint8Array = stripped ?? (await reencode(bytes, contentType));
    let reencoded = stripped === null;
    // Belt and braces: if anything identifying survived the walk, let sharp write the picture anew.
    if (!reencoded && hasMetadata(await open(stored).metadata())) {
      stored = await reencode(bytes, contentType);
      reencoded = true;
    }
    // Decoding the whole picture for the thumbnail also proves it is not truncated or malformed.
    const thumbnail = await open(stored)
      .resize(THUMBNAIL_SIZE_PX, THUMBNAIL_SIZE_PX, { fit: "inside", withoutEnlargement: true })
      .webp({ quality: 80 })
      .toBuffer();
    return { bytes: stored, thumbnail, reencoded };
  } catch {
    return null;
  }
}
