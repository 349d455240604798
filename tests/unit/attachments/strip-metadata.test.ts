import fc from "fast-check";
import sharp from "sharp";
import { describe, expect, it } from "vitest";
import { prepareImage, THUMBNAIL_SIZE_PX } from "@/lib/attachments/images";
import { stripImageMetadata } from "@/lib/attachments/strip-metadata";
import {
  exifHasGps,
  jpegTurned,
  jpegWithGps,
  pixels,
  plainPng,
  pngChunkTypes,
  pngWithText,
  webpWithGps,
} from "../../support/attachment-files";

const toBuffer = (bytes: Uint8Array | null) => Buffer.from(bytes ?? new Uint8Array());

describe("stripImageMetadata", () => {
  it("returns a JPEG without its EXIF (GPS included), the same pixels, and exactly the APP1 segment fewer bytes", async () => {
    const jpeg = await jpegWithGps();
    expect(exifHasGps((await sharp(jpeg).metadata()).exif)).toBe(true);
    const stripped = toBuffer(stripImageMetadata(jpeg, "image/jpeg"));
    const app1At = jpeg.indexOf(Buffer.from("Exif\0\0", "latin1")) - 4; // FF E1, then the 2-byte length
    expect(jpeg[app1At]).toBe(0xff);
    expect(jpeg[app1At + 1]).toBe(0xe1);
    const app1Length = 2 + jpeg.readUInt16BE(app1At + 2);
    expect(stripped.length).toBe(jpeg.length - app1Length);
    expect(Buffer.concat([jpeg.subarray(0, app1At), jpeg.subarray(app1At + app1Length)]).equals(stripped)).toBe(true);
    const after = await sharp(stripped).metadata();
    expect(after.exif).toBeUndefined();
    expect((await pixels(stripped)).equals(await pixels(jpeg))).toBe(true);
  });

  it("returns a JPEG cut at its end-of-image marker when something trails it", async () => {
    const jpeg = await jpegWithGps({ width: 64, height: 64 });
    const trailing = Buffer.concat([jpeg, Buffer.from("trailer with a second picture's EXIF: Exif\0\0GPS", "latin1")]);
    const stripped = toBuffer(stripImageMetadata(trailing, "image/jpeg"));
    expect(stripped.subarray(-2).equals(Buffer.from([0xff, 0xd9]))).toBe(true);
    expect(stripped.includes(Buffer.from("trailer"))).toBe(false);
  });

  it("returns a PNG without eXIf and tEXt chunks and the same pixels", async () => {
    const png = await pngWithText();
    expect(pngChunkTypes(png)).toEqual(expect.arrayContaining(["eXIf", "tEXt"]));
    const stripped = toBuffer(stripImageMetadata(png, "image/png"));
    expect(pngChunkTypes(stripped)).not.toContain("eXIf");
    expect(pngChunkTypes(stripped)).not.toContain("tEXt");
    expect(pngChunkTypes(stripped).at(-1)).toBe("IEND");
    expect((await pixels(stripped)).equals(await pixels(png))).toBe(true);
  });

  it("returns a PNG without metadata byte for byte as it came", async () => {
    const png = await plainPng();
    expect(toBuffer(stripImageMetadata(png, "image/png")).equals(png)).toBe(true);
  });

  it("returns a WebP without its EXIF chunk, the VP8X flag cleared and the RIFF size right", async () => {
    const webp = await webpWithGps();
    expect((await sharp(webp).metadata()).exif).toBeDefined();
    const stripped = toBuffer(stripImageMetadata(webp, "image/webp"));
    expect(stripped.includes(Buffer.from("EXIF", "latin1"))).toBe(false);
    expect(stripped.readUInt32LE(4)).toBe(stripped.length - 8);
    expect(stripped[20] & 0x08).toBe(0); // VP8X flags byte: 12 (RIFF header) + 8 (chunk header)
    expect((await sharp(stripped).metadata()).exif).toBeUndefined();
    expect((await pixels(stripped)).equals(await pixels(webp))).toBe(true);
  });

  it("returns null for bytes that are not the format they are said to be", () => {
    const junk = Buffer.from("not an image at all");
    expect(stripImageMetadata(junk, "image/jpeg")).toBeNull();
    expect(stripImageMetadata(junk, "image/png")).toBeNull();
    expect(stripImageMetadata(junk, "image/webp")).toBeNull();
  });

  it("returns null or bytes, never throws, whatever follows a valid signature", () => {
    const starts = {
      "image/jpeg": [0xff, 0xd8],
      "image/png": [0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a],
      "image/webp": [...Buffer.from("RIFF\x10\0\0\0WEBP", "latin1")],
    } as const;
    fc.assert(
      fc.property(fc.constantFrom(...(Object.keys(starts) as (keyof typeof starts)[])), fc.uint8Array({ maxLength: 300 }), (type, tail) => {
        const out = stripImageMetadata(new Uint8Array([...starts[type], ...tail]), type);
        expect(out === null || out instanceof Uint8Array).toBe(true);
      }),
      { numRuns: 300 },
    );
  });
});

describe("prepareImage", () => {
  it("returns the photo stripped losslessly and a WebP thumbnail that fits the square", async () => {
    const jpeg = await jpegWithGps({ width: 1200, height: 800 });
    const prepared = await prepareImage(jpeg, "image/jpeg");
    expect(prepared?.reencoded).toBe(false);
    expect((await pixels(prepared!.bytes)).equals(await pixels(jpeg))).toBe(true);
    const thumb = await sharp(prepared!.thumbnail).metadata();
    expect(thumb.format).toBe("webp");
    expect(Math.max(thumb.width ?? 0, thumb.height ?? 0)).toBe(THUMBNAIL_SIZE_PX);
    expect(thumb.exif).toBeUndefined();
  });

  it("returns a photo that its EXIF said to turn, turned upright and re-encoded without metadata", async () => {
    const turned = await jpegTurned(); // stored 300 × 200, shown 200 × 300
    const prepared = await prepareImage(turned, "image/jpeg");
    expect(prepared?.reencoded).toBe(true);
    const meta = await sharp(prepared!.bytes).metadata();
    expect([meta.width, meta.height]).toEqual([200, 300]);
    expect(meta.exif).toBeUndefined();
    expect(meta.orientation ?? 1).toBe(1);
  });

  it("returns null for bytes that start like a photo but are not one", async () => {
    const fake = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0]), Buffer.alloc(5000, 1)]);
    expect(await prepareImage(fake, "image/jpeg")).toBeNull();
  });
});
