import { PDFDocument, StandardFonts } from "pdf-lib";
import sharp from "sharp";

// Real files of every kind an attachment can be, and of kinds it must not be, made in the test.

/** A made-up spot for the GPS tag (degrees/minutes/seconds as EXIF rationals); no real place is meant. */
export const FIXTURE_GPS = { GPSLatitudeRef: "N", GPSLatitude: "51/1 28/1 4000/100", GPSLongitudeRef: "W", GPSLongitude: "2/1 35/1 0/1" };

/** A JPEG of a teal-and-grey test card with EXIF naming a camera and carrying GPS coordinates. */
export async function jpegWithGps({ width = 640, height = 480 }: { width?: number; height?: number } = {}): Promise<Buffer> {
  return sharp(await testCard(width, height))
    .jpeg({ quality: 85 })
    .withExif({ IFD0: { Make: "Fixture rig", Software: "trimrail-tests" }, IFD3: FIXTURE_GPS })
    .toBuffer();
}

/** A JPEG whose EXIF says "turn 90° clockwise to view" (orientation 6), as phones write. */
export async function jpegTurned(): Promise<Buffer> {
  return sharp(await testCard(300, 200))
    .jpeg()
    .withMetadata({ orientation: 6 })
    .toBuffer();
}

/** A PNG with an eXIf chunk and, added by hand, a tEXt comment. */
export async function pngWithText(): Promise<Buffer> {
  const png = await sharp(await testCard(200, 120))
    .png()
    .withExif({ IFD0: { Make: "Fixture rig" } })
    .toBuffer();
  return insertPngChunk(png, "tEXt", Buffer.from("Comment\0taken behind the workshop", "latin1"));
}

export async function plainPng(): Promise<Buffer> {
  return sharp(await testCard(200, 120))
    .png()
    .toBuffer();
}

/** A WebP with EXIF (GPS included): the extended (VP8X) layout with its EXIF flag set. */
export async function webpWithGps(): Promise<Buffer> {
  return sharp(await testCard(240, 160))
    .webp({ quality: 80 })
    .withExif({ IFD0: { Make: "Fixture rig" }, IFD3: FIXTURE_GPS })
    .toBuffer();
}

/** A small valid one-page datasheet. */
export async function datasheetPdf(title = "Relay box R2 — datasheet"): Promise<Buffer> {
  const doc = await PDFDocument.create();
  const page = doc.addPage([420, 595]);
  const font = await doc.embedFont(StandardFonts.Helvetica);
  page.drawText(title, { x: 40, y: 540, size: 16, font });
  page.drawText("Mass 148 g · 1/4-20 UNC insert · 12 V", { x: 40, y: 510, size: 11, font });
  return Buffer.from(await doc.save());
}

/** The start of a Linux executable (ELF header) and some code-like bytes: what a renamed program looks like. */
export function renamedExecutable(): Buffer {
  const header = Buffer.from([
    0x7f, 0x45, 0x4c, 0x46, 0x02, 0x01, 0x01, 0x00, 0, 0, 0, 0, 0, 0, 0, 0, 0x02, 0x00, 0x3e, 0x00, 0x01, 0, 0, 0,
  ]);
  return Buffer.concat([header, Buffer.alloc(8000, 0x90)]);
}

export function htmlPage(): Buffer {
  return Buffer.from(
    "<!doctype html><html><head><title>x</title></head><body><script>alert(document.cookie)</script></body></html>\n".repeat(60),
  );
}

/** Bytes of one pattern for a body of `sizeBytes`: a JPEG's first bytes, then filler. */
export function oversizedJpegLike(sizeBytes: number, start: Buffer): Buffer {
  const out = Buffer.alloc(sizeBytes, 0x5a);
  start.copy(out, 0, 0, Math.min(start.length, 4096));
  return out;
}

async function testCard(width: number, height: number): Promise<Buffer> {
  const half = Math.floor(width / 2);
  return sharp({ create: { width, height, channels: 3, background: "#9aa3ab" } })
    .composite([{ input: { create: { width: half, height, channels: 3, background: "#1d7f7a" } }, left: 0, top: 0 }])
    .png()
    .toBuffer();
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});

/** CRC-32 as PNG chunks use it (W3C PNG, Annex D). */
function crc32(bytes: Buffer): number {
  let c = 0xffffffff;
  for (const b of bytes) c = CRC_TABLE[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}

/** Inserts a chunk right after IHDR (8-byte signature + 25-byte IHDR chunk). */
export function insertPngChunk(png: Buffer, type: string, data: Buffer): Buffer {
  const typed = Buffer.concat([Buffer.from(type, "latin1"), data]);
  const chunk = Buffer.alloc(12 + data.length);
  chunk.writeUInt32BE(data.length, 0);
  typed.copy(chunk, 4);
  chunk.writeUInt32BE(crc32(typed), 8 + data.length);
  return Buffer.concat([png.subarray(0, 33), chunk, png.subarray(33)]);
}

/** The chunk types of a PNG in order. */
export function pngChunkTypes(png: Buffer): string[] {
  const types: string[] = [];
  for (let i = 8; i + 8 <= png.length;) {
    const length = png.readUInt32BE(i);
    types.push(png.toString("latin1", i + 4, i + 8));
    i += 12 + length;
  }
  return types;
}

/**
 * Whether an EXIF block (as sharp's metadata() returns it: "Exif\0\0" then TIFF) has a GPS IFD:
 * IFD0 tag 0x8825 (GPSInfo), per the EXIF 2.3 standard (CIPA DC-008), read independently of the app.
 */
export function exifHasGps(exif: Buffer | undefined): boolean {
  if (!exif) return false;
  const tiff = exif.subarray(exif.toString("latin1", 0, 4) === "Exif" ? 6 : 0);
  const little = tiff.toString("latin1", 0, 2) === "II";
  const u16 = (at: number) => (little ? tiff.readUInt16LE(at) : tiff.readUInt16BE(at));
  const u32 = (at: number) => (little ? tiff.readUInt32LE(at) : tiff.readUInt32BE(at));
  const ifd0 = u32(4);
  const entries = u16(ifd0);
  for (let i = 0; i < entries; i++) if (u16(ifd0 + 2 + i * 12) === 0x8825) return true;
  return false;
}

/** The decoded pixels, to show two files hold the same picture. */
export async function pixels(image: Buffer | Uint8Array): Promise<Buffer> {
  return sharp(image).raw().toBuffer();
}

/**
 * A made-up "photo" of a payload on its mount (an SVG scene rendered by sharp, with some grain so
 * it is photo-sized, ~1 MB), carrying GPS EXIF as a phone's would.
 */
export async function payloadPhoto({ width = 1800, height = 1200 }: { width?: number; height?: number } = {}): Promise<Buffer> {
  const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 180 120">
    <defs><linearGradient id="sky" x1="0" y1="0" x2="0" y2="1"><stop offset="0" stop-color="#b9cfdc"/><stop offset="1" stop-color="#e9eef0"/></linearGradient></defs>
    <rect width="180" height="120" fill="url(#sky)"/>
    <rect y="92" width="180" height="28" fill="#7d8f6a"/>
    <ellipse cx="90" cy="38" rx="62" ry="20" fill="#c9ccd0" stroke="#8c9299" stroke-width="1"/>
    <path d="M40 38 Q90 30 140 38" fill="none" stroke="#8c9299" stroke-width="0.6"/>
    <rect x="78" y="56" width="24" height="4" rx="1" fill="#4c5560"/>
    <rect x="82" y="61" width="16" height="12" rx="1.5" fill="#1d7f7a"/>
    <circle cx="90" cy="67" r="3" fill="#14202e"/>
    <line x1="90" y1="73" x2="90" y2="120" stroke="#3a3f45" stroke-width="0.5"/>
  </svg>`;
  const scene = await sharp(Buffer.from(svg)).removeAlpha().raw().toBuffer({ resolveWithObject: true });
  const grain = Buffer.from(scene.data);
  let seed = 7;
  for (let i = 0; i < grain.length; i++) {
    seed = (seed * 1103515245 + 12345) & 0x7fffffff; // a fixed LCG: the same grain every run
    grain[i] = Math.max(0, Math.min(255, grain[i] + ((seed >> 16) % 17) - 8));
  }
  return sharp(grain, { raw: { width: scene.info.width, height: scene.info.height, channels: scene.info.channels } })
    .jpeg({ quality: 90 })
    .withExif({ IFD0: { Make: "Fixture rig", Software: "trimrail-tests" }, IFD3: FIXTURE_GPS })
    .toBuffer();
}
