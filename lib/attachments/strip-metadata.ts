import type { AttachmentContentType } from "@/lib/domain";

// Removes what a photo says about where, when and with what it was taken (EXIF with GPS, XMP,
// IPTC, comments, text chunks) without decoding the picture: the stored file is the uploaded one
// less those blocks, pixel for pixel. Each format keeps a short list of the blocks needed to show
// the picture right and drops everything else, including anything after the image's end.
// Layouts: JPEG — ITU-T T.81 (markers) and JFIF 1.02; PNG — W3C PNG (Third Edition), chunks;
// WebP — Google's "WebP Container Specification" (RIFF, VP8X flags).

/** The stripped bytes, or null when the file's structure cannot be walked (the caller re-encodes it). */
export function stripImageMetadata(bytes: Uint8Array, contentType: AttachmentContentType): Uint8Array | null {
  switch (contentType) {
    case "image/jpeg":
      return stripJpeg(bytes);
    case "image/png":
      return stripPng(bytes);
    case "image/webp":
      return stripWebp(bytes);
    default:
      return bytes;
  }
}

function concat(parts: Uint8Array[]): Uint8Array {
  const out = new Uint8Array(parts.reduce((n, p) => n + p.byteLength, 0));
  let at = 0;
  for (const part of parts) {
    out.set(part, at);
    at += part.byteLength;
  }
  return out;
}

const ascii = (bytes: Uint8Array, start: number, length: number) => String.fromCharCode(...bytes.subarray(start, start + length));

// ---------------------------------------------------------------- JPEG

const SOI = 0xd8;
const EOI = 0xd9;
const SOS = 0xda;
const APP0 = 0xe0;
const APP2 = 0xe2;
const APP14 = 0xee;
const COM = 0xfe;

/** APP0 (JFIF), APP2 only when it holds an ICC colour profile, APP14 (Adobe colour transform): needed to show the picture. */
function keepJpegSegment(marker: number, bytes: Uint8Array, payloadStart: number): boolean {
  if (marker === APP0 || marker === APP14) return true;
  if (marker === APP2) return ascii(bytes, payloadStart, 12) === "ICC_PROFILE\0";
  if (marker > APP0 && marker <= 0xef) return false; // APP1 (EXIF, XMP), APP13 (IPTC) and the other application blocks
  return marker !== COM;
}

/** Length of entropy-coded data from `start` up to the next real marker (stuffed 0xFF00 and restart markers are data). */
function entropyEnd(bytes: Uint8Array, start: number): number {
  let i = start;
  while (i + 1 < bytes.length) {
    if (bytes[i] === 0xff) {
      const next = bytes[i + 1];
      if (next === 0x00 || (next >= 0xd0 && next <= 0xd7) || next === 0xff) {
        i += next === 0xff ? 1 : 2;
        continue;
      }
      return i;
    }
    i += 1;
  }
  return -1;
}

function stripJpeg(bytes: Uint8Array): Uint8Array | null {
  if (bytes[0] !== 0xff || bytes[1] !== SOI) return null;
  const kept: Uint8Array[] = [bytes.subarray(0, 2)];
  let i = 2;
  while (i < bytes.length) {
    if (bytes[i] !== 0xff) return null;
    while (bytes[i + 1] === 0xff) i += 1; // fill bytes before a marker
    const marker = bytes[i + 1];
    if (marker === undefined) return null;
    if (marker === EOI) {
      kept.push(bytes.subarray(i, i + 2));
      return concat(kept); // whatever follows the end of the image (a second picture, a trailer) goes
    }
    if (i + 4 > bytes.length) return null;
    const length = (bytes[i + 2] << 8) | bytes[i + 3];
    const segmentEnd = i + 2 + length;
    if (length < 2 || segmentEnd > bytes.length) return null;
    if (keepJpegSegment(marker, bytes, i + 4)) kept.push(bytes.subarray(i, segmentEnd));
    i = segmentEnd;
    if (marker === SOS) {
      const end = entropyEnd(bytes, i);
      if (end < 0) return null;
      kept.push(bytes.subarray(i, end));
      i = end;
    }
  }
  return null; // no end-of-image marker
}

// ---------------------------------------------------------------- PNG

const PNG_SIGNATURE = [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a];
/** Critical chunks, the ones that change how the picture looks, and APNG's frames. Text (tEXt, zTXt, iTXt), eXIf and tIME go. */
const PNG_KEPT = new Set([
  "IHDR",
  "PLTE",
  "IDAT",
  "IEND",
  "tRNS",
  "cHRM",
  "gAMA",
  "iCCP",
  "sBIT",
  "sRGB",
  "cICP",
  "mDCV",
  "cLLI",
  "bKGD",
  "hIST",
  "pHYs",
  "sPLT",
  "acTL",
  "fcTL",
  "fdAT",
]);

function stripPng(bytes: Uint8Array): Uint8Array | null {
  if (!PNG_SIGNATURE.every((b, i) => bytes[i] === b)) return null;
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const kept: Uint8Array[] = [bytes.subarray(0, 8)];
  let i = 8;
  while (i + 12 <= bytes.length) {
    const length = view.getUint32(i);
    const type = ascii(bytes, i + 4, 4);
    const end = i + 12 + length;
    if (end > bytes.length) return null;
    if (PNG_KEPT.has(type)) kept.push(bytes.subarray(i, end));
    if (type === "IEND") return concat(kept);
    i = end;
  }
  return null;
}

// ---------------------------------------------------------------- WebP

const WEBP_KEPT = new Set(["VP8 ", "VP8L", "VP8X", "ALPH", "ANIM", "ANMF", "ICCP"]);
const VP8X_EXIF_FLAG = 0x08;
const VP8X_XMP_FLAG = 0x04;

function stripWebp(bytes: Uint8Array): Uint8Array | null {
  if (bytes.length < 12 || ascii(bytes, 0, 4) !== "RIFF" || ascii(bytes, 8, 4) !== "WEBP") return null;
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const riffEnd = 8 + view.getUint32(4, true);
  if (riffEnd > bytes.length) return null;
  const chunks: Uint8Array[] = [];
  let i = 12;
  while (i + 8 <= riffEnd) {
    const fourcc = ascii(bytes, i, 4);
    const size = view.getUint32(i + 4, true);
    const end = i + 8 + size + (size % 2); // chunks are padded to an even length
    if (end > riffEnd) return null;
    if (WEBP_KEPT.has(fourcc)) {
      const chunk = bytes.slice(i, end);
      if (fourcc === "VP8X" && size >= 1) chunk[8] &= ~(VP8X_EXIF_FLAG | VP8X_XMP_FLAG);
      chunks.push(chunk);
    }
    i = end;
  }
  if (i !== riffEnd) return null;
  const body = concat(chunks);
  const header = new Uint8Array(12);
  header.set(bytes.subarray(0, 12));
  new DataView(header.buffer).setUint32(4, 4 + body.byteLength, true);
  return concat([header, body]);
}
