import { eq } from "drizzle-orm";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase } from "../../db/index";
import { attachments } from "../../db/schema";
import { storageConfig } from "../../lib/storage/config";
import { createS3Client } from "../../lib/storage/s3-client";
import {
  datasheetPdf,
  exifHasGps,
  htmlPage,
  jpegWithGps,
  oversizedJpegLike,
  pixels,
  plainPng,
  pngChunkTypes,
  pngWithText,
  renamedExecutable,
  webpWithGps,
} from "../support/attachment-files";
import {
  countAttachmentRows,
  listObjectKeys,
  processGroupRssBytes,
  readObject,
  streamUpload,
  uploadFile,
  type AttachmentBody,
} from "../support/attachments-api";
import { ApiClient } from "../support/http";
import { readSetupOver, submittedSetup } from "../support/setup-fixtures";

// Attachments over HTTP against the running server, its database and its own S3 fake on loopback.

const baseURL = inject("baseURL");
const s3Config = storageConfig(inject("s3Env"))!;
const s3 = createS3Client(s3Config);
const MB = 1024 * 1024;

let database: ReturnType<typeof openDatabase>;
// Client addresses of this file's own (sign-in limits count per address and per minute, across files).
const wren = new ApiClient(baseURL, "10.89.0.1"); // customer: owns set-wren-whip (a draft)
const mirela = new ApiClient(baseURL, "10.89.0.2"); // another customer
const support = new ApiClient(baseURL, "10.89.0.3");
const stranger = new ApiClient(baseURL, "10.89.0.4"); // not signed in

/** A fresh draft of Wren's, so each group of tests counts its own files. */
async function newDraft(name: string): Promise<string> {
  const source = await readSetupOver(wren, "set-wren-whip");
  const created = await wren.request("POST", "/api/setups", { draft: { ...source.draft, name } });
  expect(created.status).toBe(201);
  return ((await created.json()) as { id: string }).id;
}

async function uploaded(setupId: string, file: { bytes: Uint8Array; name: string; claimedType?: string }): Promise<AttachmentBody> {
  const response = await uploadFile(wren, setupId, file);
  expect(response.status, await response.clone().text()).toBe(201);
  return (await response.json()) as AttachmentBody;
}

async function storageKeyOf(id: string): Promise<string> {
  const [row] = await database.db.select({ key: attachments.storageKey }).from(attachments).where(eq(attachments.id, id));
  return row.key;
}

function formWithoutFile(): FormData {
  const form = new FormData();
  form.append("note", "the photo is coming later");
  return form;
}

const bytesOf = async (response: Response) => Buffer.from(await response.arrayBuffer());

/** Rows in the database and objects in the fake, before and after: a refused upload must change neither. */
async function storedCounts(setupId: string): Promise<{ rows: number; objects: number }> {
  return { rows: await countAttachmentRows(database.db, setupId), objects: (await listObjectKeys(s3, s3Config.bucket)).length };
}

beforeAll(async () => {
  database = openDatabase(inject("databaseUrl"));
  expect((await wren.signIn("customer@trimrail.test")).status).toBe(200);
  expect((await mirela.signIn("mirela@trimrail.test")).status).toBe(200);
  expect((await support.signIn("support@trimrail.test")).status).toBe(200);
});
afterAll(() => database?.client.close());

describe("POST /api/setups/:id/attachments and GET /api/attachments/:id", () => {
  let setupId: string;
  beforeAll(async () => {
    setupId = await newDraft("Attachments: every kind");
  });

  it("returns a JPEG without its GPS EXIF, the same pixels, and the uploaded bytes less the EXIF segment", async () => {
    const jpeg = await jpegWithGps();
    expect(exifHasGps((await sharp(jpeg).metadata()).exif)).toBe(true);
    const view = await uploaded(setupId, { bytes: jpeg, name: "camera on the mount.jpg", claimedType: "image/jpeg" });
    expect(view).toMatchObject({ setupId, fileName: "camera on the mount.jpg", contentType: "image/jpeg", kind: "image" });

    const download = await wren.get(view.url);
    expect(download.status).toBe(200);
    expect(download.headers.get("content-type")).toBe("image/jpeg");
    expect(download.headers.get("x-content-type-options")).toBe("nosniff");
    expect(download.headers.get("content-disposition")).toMatch(/^inline;/);
    const served = await bytesOf(download);
    const metadata = await sharp(served).metadata();
    expect(metadata.exif).toBeUndefined();
    expect(exifHasGps(metadata.exif)).toBe(false);
    expect((await pixels(served)).equals(await pixels(jpeg))).toBe(true);
    // Exactly the APP1 (EXIF) segment is gone: FF E1, a 2-byte length, "Exif\0\0" (JPEG/EXIF layout).
    const app1At = jpeg.indexOf(Buffer.from("Exif\0\0", "latin1")) - 4;
    const app1Length = 2 + jpeg.readUInt16BE(app1At + 2);
    expect(served.equals(Buffer.concat([jpeg.subarray(0, app1At), jpeg.subarray(app1At + app1Length)]))).toBe(true);
    expect(view.sizeBytes).toBe(served.length);

    // What the fake keeps is what is served, under a random key that has nothing of the file's name.
    const key = await storageKeyOf(view.id);
    expect(key).toMatch(/^attachments\/[0-9a-f-]{36}$/);
    const stored = await readObject(s3, s3Config.bucket, key);
    expect(stored.bytes.equals(served)).toBe(true);
    expect(stored.contentType).toBe("image/jpeg");
  });

  it("returns a PNG without its text and EXIF chunks, and a PNG without metadata byte for byte", async () => {
    const tagged = await pngWithText();
    const view = await uploaded(setupId, { bytes: tagged, name: "mount-close-up.png", claimedType: "image/png" });
    const served = await bytesOf(await wren.get(view.url));
    expect(pngChunkTypes(served)).not.toContain("tEXt");
    expect(pngChunkTypes(served)).not.toContain("eXIf");
    expect((await pixels(served)).equals(await pixels(tagged))).toBe(true);

    const plain = await plainPng();
    const plainView = await uploaded(setupId, { bytes: plain, name: "plain.png" });
    const plainServed = await bytesOf(await wren.get(plainView.url));
    expect(plainServed.equals(plain)).toBe(true);
    expect((await readObject(s3, s3Config.bucket, await storageKeyOf(plainView.id))).bytes.equals(plain)).toBe(true);
  });

  it("returns a WebP without its GPS EXIF and the same pixels", async () => {
    const webp = await webpWithGps();
    expect(exifHasGps((await sharp(webp).metadata()).exif)).toBe(true);
    const view = await uploaded(setupId, { bytes: webp, name: "rig.webp", claimedType: "image/webp" });
    expect(view.contentType).toBe("image/webp");
    const served = await bytesOf(await wren.get(view.url));
    expect((await sharp(served).metadata()).exif).toBeUndefined();
    expect((await pixels(served)).equals(await pixels(webp))).toBe(true);
  });

  it("returns a PDF as sent, byte for byte, as a download", async () => {
    const pdf = await datasheetPdf();
    // The browser's claim is ignored: the content says PDF.
    const view = await uploaded(setupId, { bytes: pdf, name: "relay datasheet.pdf", claimedType: "text/plain" });
    expect(view).toMatchObject({ contentType: "application/pdf", kind: "pdf", thumbnailUrl: null, sizeBytes: pdf.length });
    const download = await wren.get(view.url);
    expect(download.headers.get("content-type")).toBe("application/pdf");
    expect(download.headers.get("content-disposition")).toBe('attachment; filename="relay_datasheet.pdf"');
    expect(download.headers.get("x-content-type-options")).toBe("nosniff");
    expect((await bytesOf(download)).equals(pdf)).toBe(true);
    expect((await readObject(s3, s3Config.bucket, await storageKeyOf(view.id))).bytes.equals(pdf)).toBe(true);
    expect((await wren.get(`${view.url}/thumbnail`)).status).toBe(404);
  });

  it("returns a WebP thumbnail of a photo that fits 320 px", async () => {
    const view = await uploaded(setupId, { bytes: await jpegWithGps({ width: 1600, height: 1200 }), name: "wide.jpg" });
    const thumb = await wren.get(view.thumbnailUrl!);
    expect(thumb.status).toBe(200);
    expect(thumb.headers.get("content-type")).toBe("image/webp");
    expect(thumb.headers.get("x-content-type-options")).toBe("nosniff");
    const meta = await sharp(await bytesOf(thumb)).metadata();
    expect([meta.width, meta.height]).toEqual([320, 240]);
    expect(meta.exif).toBeUndefined();
  });

  it("lists the setup's files in the order they came", async () => {
    const list = await wren.get(`/api/setups/${setupId}/attachments`);
    expect(list.status).toBe(200);
    const { attachments: files } = (await list.json()) as { attachments: AttachmentBody[] };
    expect(files.map((f) => f.fileName)).toEqual([
      "camera on the mount.jpg",
      "mount-close-up.png",
      "plain.png",
      "rig.webp",
      "relay datasheet.pdf",
      "wide.jpg",
    ]);
  });
});

describe("a refused upload", () => {
  let setupId: string;
  beforeAll(async () => {
    setupId = await newDraft("Attachments: refusals");
    await uploaded(setupId, { bytes: await plainPng(), name: "the one good file.png" });
  });

  const refusals: { name: string; status: number; code: string; send: () => Promise<Response> }[] = [
    {
      name: "a renamed executable",
      status: 415,
      code: "unsupported_media_type",
      send: () => uploadFile(wren, setupId, { bytes: renamedExecutable(), name: "photo.jpg", claimedType: "image/jpeg" }),
    },
    {
      name: "an HTML file named .png",
      status: 415,
      code: "unsupported_media_type",
      send: () => uploadFile(wren, setupId, { bytes: htmlPage(), name: "mount.png", claimedType: "image/png" }),
    },
    {
      name: "an 11 MB file",
      status: 413,
      code: "payload_too_large",
      send: async () =>
        uploadFile(wren, setupId, { bytes: oversizedJpegLike(11 * MB, await jpegWithGps()), name: "huge.jpg", claimedType: "image/jpeg" }),
    },
    {
      name: "a body without a file",
      status: 400,
      code: "bad_request",
      send: () => wren.upload(`/api/setups/${setupId}/attachments`, formWithoutFile()),
    },
  ];

  for (const refusal of refusals) {
    it(`returns ${refusal.status} for ${refusal.name} and writes neither a row nor an object`, async () => {
      const before = await storedCounts(setupId);
      const response = await refusal.send();
      expect(response.status).toBe(refusal.status);
      expect(((await response.json()) as { error: { code: string } }).error.code).toBe(refusal.code);
      expect(await storedCounts(setupId)).toEqual(before);
    });
  }

  it("returns 413 for an 11 MB file streamed without a length, once the 10 MB mark passes, and writes nothing", async () => {
    const before = await storedCounts(setupId);
    const outcome = await streamUpload(baseURL, wren.cookieHeader(), setupId, { fileBytes: 11 * MB, start: await jpegWithGps() });
    expect(outcome.status).toBe(413);
    expect(JSON.parse(outcome.body).error.code).toBe("payload_too_large");
    expect(await storedCounts(setupId)).toEqual(before);
  });

  it("returns 413 to a 200 MB stream at the 10 MB mark, reads no more of it, and hangs up", async () => {
    const outcome = await streamUpload(baseURL, wren.cookieHeader(), setupId, {
      fileBytes: 200 * MB,
      start: await jpegWithGps(),
      keepSending: true,
    });
    expect(outcome.status, outcome.error ?? "").toBe(413);
    // 10 MB read, then nothing: all else that got out filled the sockets' buffers, until the server
    // dropped the stalled connection (Node's keep-alive timeout, 5 s by default).
    expect(outcome.sentBytes).toBeLessThan(40 * MB);
    expect(outcome.error).toMatch(/ECONNRESET|EPIPE|socket hang up/);
  }, 30_000);

  it("returns 409 for a 21st file and writes neither a row nor an object", async () => {
    const full = await newDraft("Attachments: twenty");
    const small = await plainPng();
    for (let i = 1; i <= 20; i++) await uploaded(full, { bytes: small, name: `tab ${i}.png` });
    const before = await storedCounts(full);
    expect(before.rows).toBe(20);
    const response = await uploadFile(wren, full, { bytes: small, name: "tab 21.png" });
    expect(response.status).toBe(409);
    expect(((await response.json()) as { error: { code: string; message: string } }).error).toMatchObject({
      code: "conflict",
      message: expect.stringMatching(/at most 20 files/),
    });
    expect(await storedCounts(full)).toEqual(before);
  });

  it("returns 404 for another customer's setup, 403 for support on a submitted one, 401 when signed out, and writes nothing", async () => {
    const submitted = await submittedSetup(database.db, wren, { from: "set-wren-cam", name: "Attachments: submitted, staff upload" });
    const before = await storedCounts(setupId);
    const png = { bytes: await plainPng(), name: "x.png" };
    expect((await uploadFile(mirela, setupId, png)).status).toBe(404);
    expect((await uploadFile(support, setupId, png)).status).toBe(404); // a draft: staff do not see it
    expect((await uploadFile(support, submitted.id, png)).status).toBe(403);
    expect((await uploadFile(stranger, setupId, png)).status).toBe(401);
    expect(await storedCounts(setupId)).toEqual(before);
  });
});

describe("who may read and delete", () => {
  let draftFile: AttachmentBody;
  let submittedFile: AttachmentBody;
  let submittedId: string;
  beforeAll(async () => {
    const draftId = await newDraft("Attachments: access");
    draftFile = await uploaded(draftId, { bytes: await jpegWithGps(), name: "draft photo.jpg" });
    submittedId = (await submittedSetup(database.db, wren, { from: "set-wren-cam", name: "Attachments: access, submitted" })).id;
    submittedFile = await uploaded(submittedId, { bytes: await datasheetPdf(), name: "sheet.pdf" });
  });

  it("returns 404 to another customer for the list, the file, the thumbnail and a delete", async () => {
    expect((await mirela.get(`/api/setups/${draftFile.setupId}/attachments`)).status).toBe(404);
    expect((await mirela.get(draftFile.url)).status).toBe(404);
    expect((await mirela.get(draftFile.thumbnailUrl!)).status).toBe(404);
    expect((await mirela.request("DELETE", draftFile.url)).status).toBe(404);
    expect((await mirela.request("DELETE", submittedFile.url)).status).toBe(404);
    expect((await wren.get(draftFile.url)).status).toBe(200); // still there
  });

  it("returns a submitted setup's files to support, a draft's not at all, and refuses support's delete with 403", async () => {
    const list = await support.get(`/api/setups/${submittedId}/attachments`);
    expect(list.status).toBe(200);
    expect(((await list.json()) as { attachments: AttachmentBody[] }).attachments.map((a) => a.fileName)).toEqual(["sheet.pdf"]);
    expect((await support.get(submittedFile.url)).status).toBe(200);
    expect((await support.get(draftFile.url)).status).toBe(404);
    expect((await support.get(`/api/setups/${draftFile.setupId}/attachments`)).status).toBe(404);
    expect((await support.request("DELETE", submittedFile.url)).status).toBe(403);
    expect((await stranger.get(submittedFile.url)).status).toBe(401);
  });

  it("returns 204 to the owner's delete and removes the row, the photo and its thumbnail from the fake", async () => {
    const key = await storageKeyOf(draftFile.id);
    const keysBefore = await listObjectKeys(s3, s3Config.bucket);
    expect(keysBefore).toEqual(expect.arrayContaining([key, `${key}.thumb.webp`]));
    expect((await wren.request("DELETE", draftFile.url)).status).toBe(204);
    const keysAfter = await listObjectKeys(s3, s3Config.bucket);
    expect(keysAfter).not.toContain(key);
    expect(keysAfter).not.toContain(`${key}.thumb.webp`);
    expect(keysAfter.length).toBe(keysBefore.length - 2);
    expect(await countAttachmentRows(database.db, draftFile.setupId)).toBe(0);
    expect((await wren.get(draftFile.url)).status).toBe(404);
    expect((await wren.request("DELETE", draftFile.url)).status).toBe(404);
  });
});

describe("DELETE /api/setups/:id", () => {
  it("removes the setup's attachments' objects from the fake with the setup", async () => {
    const setupId = await newDraft("Attachments: setup to delete");
    const photo = await uploaded(setupId, { bytes: await jpegWithGps(), name: "a.jpg" });
    const sheet = await uploaded(setupId, { bytes: await datasheetPdf(), name: "b.pdf" });
    const keys = [await storageKeyOf(photo.id), await storageKeyOf(sheet.id)];
    expect((await wren.request("DELETE", `/api/setups/${setupId}`)).status).toBe(204);
    const remaining = await listObjectKeys(s3, s3Config.bucket);
    for (const key of keys) {
      expect(remaining).not.toContain(key);
      expect(remaining).not.toContain(`${key}.thumb.webp`);
    }
    expect(await countAttachmentRows(database.db, setupId)).toBe(0);
  });
});

describe("server memory while uploads are refused", () => {
  it("grows by less than 50 MB while ten 11 MB uploads are refused at once", async () => {
    const setupId = await newDraft("Attachments: memory");
    const serverPid = inject("serverPid");
    const start = await jpegWithGps();
    // Warm the route up first, so loading its code is not counted as growth.
    expect((await streamUpload(baseURL, wren.cookieHeader(), setupId, { fileBytes: 11 * MB, start })).status).toBe(413);
    const baseline = Math.max(...(await sampleFor(processGroupRssBytes, serverPid, 500)));

    let peak = baseline;
    let sampling = true;
    const sampler = (async () => {
      while (sampling) {
        peak = Math.max(peak, processGroupRssBytes(serverPid));
        await new Promise((r) => setTimeout(r, 20));
      }
    })();
    const outcomes = await Promise.all(
      Array.from({ length: 10 }, () => streamUpload(baseURL, wren.cookieHeader(), setupId, { fileBytes: 11 * MB, start })),
    );
    sampling = false;
    await sampler;

    expect(outcomes.map((o) => o.status)).toEqual(Array(10).fill(413));
    const growthMb = (peak - baseline) / MB;
    console.log(
      `[memory] next start RSS: baseline ${(baseline / MB).toFixed(1)} MB, peak ${(peak / MB).toFixed(1)} MB, growth ${growthMb.toFixed(1)} MB while ten 11 MB uploads were refused`,
    );
    expect(growthMb).toBeLessThan(50);
    expect(await countAttachmentRows(database.db, setupId)).toBe(0);
  });
});

async function sampleFor(read: (pid: number) => number, pid: number, ms: number): Promise<number[]> {
  const samples: number[] = [];
  const until = Date.now() + ms;
  while (Date.now() < until) {
    samples.push(read(pid));
    await new Promise((r) => setTimeout(r, 25));
  }
  return samples;
}
