import { ListObjectsV2Command } from "@aws-sdk/client-s3";
import { randomBytes } from "node:crypto";
import { mkdtempSync, rmSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { Readable } from "node:stream";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { storageConfig } from "@/lib/storage/config";
import { getObjectStore, type ObjectStore } from "@/lib/storage/object-store";
import { createS3Client } from "@/lib/storage/s3-client";
import { startS3Fake, type S3Fake } from "../../../scripts/s3-fake";

// The app's object store, configured from S3_* variables exactly as the server is, against the fake on loopback.

const dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-s3-fake-"));
let fake: S3Fake;
let store: ObjectStore;

const bytesOf = async (stream: ReadableStream<Uint8Array>) => Buffer.from(await new Response(stream).arrayBuffer());

beforeAll(async () => {
  fake = await startS3Fake({ dir });
  store = getObjectStore(storageConfig(fake.env))!;
});
afterAll(async () => {
  await fake.stop();
  rmSync(dir, { recursive: true, force: true });
});

describe("storageConfig", () => {
  it("returns null without S3_BUCKET, and the bucket, endpoint, keys and path style when set", () => {
    expect(storageConfig({})).toBeNull();
    expect(storageConfig({ S3_BUCKET: "b" })).toEqual({
      bucket: "b",
      region: "us-east-1",
      endpoint: undefined,
      credentials: undefined,
      forcePathStyle: false,
    });
    expect(storageConfig(fake.env)).toMatchObject({
      bucket: fake.bucket,
      endpoint: fake.endpoint,
      forcePathStyle: true,
      credentials: { accessKeyId: "S3RVER" },
    });
  });
});

describe("the object store against the S3 fake", () => {
  it("listens on 127.0.0.1", () => {
    expect(fake.endpoint).toMatch(/^http:\/\/127\.0\.0\.1:\d+$/);
  });

  it("returns the very bytes a streamed put sent (no chunk framing kept)", async () => {
    const bytes = randomBytes(700_000);
    const parts = [bytes.subarray(0, 65_536), bytes.subarray(65_536, 300_000), bytes.subarray(300_000)];
    await store.put({ key: "t/streamed", body: Readable.from(parts), sizeBytes: bytes.length, contentType: "application/pdf" });
    const back = await store.get("t/streamed");
    expect(back?.sizeBytes).toBe(bytes.length);
    expect((await bytesOf(back!.body)).equals(bytes)).toBe(true);
  });

  it("returns the very bytes a buffered put sent", async () => {
    const bytes = randomBytes(10_000);
    await store.put({ key: "t/buffered", body: bytes, sizeBytes: bytes.length, contentType: "image/png" });
    expect((await bytesOf((await store.get("t/buffered"))!.body)).equals(bytes)).toBe(true);
  });

  it("returns null for a missing key, and deletes (even twice) what is there", async () => {
    expect(await store.get("t/never-written")).toBeNull();
    await store.put({ key: "t/to-delete", body: Buffer.from("x"), sizeBytes: 1, contentType: "image/png" });
    await store.delete("t/to-delete");
    await store.delete("t/to-delete");
    expect(await store.get("t/to-delete")).toBeNull();
    const listed = await createS3Client(storageConfig(fake.env)!).send(new ListObjectsV2Command({ Bucket: fake.bucket, Prefix: "t/" }));
    expect((listed.Contents ?? []).map((o) => o.Key).sort()).toEqual(["t/buffered", "t/streamed"]);
  });
});
