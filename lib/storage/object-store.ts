import "server-only";
import { DeleteObjectCommand, GetObjectCommand, NoSuchKey, PutObjectCommand, type S3Client } from "@aws-sdk/client-s3";
import type { Readable } from "node:stream";
import { storageConfig, type StorageConfig } from "./config";
import { createS3Client } from "./s3-client";

// The app's one door to the object store. Keys are chosen by the caller (random, never a person's
// file name); objects are written once and never changed, only deleted.

export interface ObjectStore {
  put(input: { key: string; body: Uint8Array | Readable; sizeBytes: number; contentType: string }): Promise<void>;
  /** The object's bytes as a stream, or null when there is no such object. */
  get(key: string): Promise<{ body: ReadableStream<Uint8Array>; sizeBytes: number | null } | null>;
  /** Deleting what is not there succeeds (S3's rule), so a retry is always safe. */
  delete(key: string): Promise<void>;
}

function storeFor(client: S3Client, bucket: string): ObjectStore {
  return {
    async put({ key, body, sizeBytes, contentType }) {
      await client.send(new PutObjectCommand({ Bucket: bucket, Key: key, Body: body, ContentLength: sizeBytes, ContentType: contentType }));
    },
    async get(key) {
      try {
        const answer = await client.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
        if (!answer.Body) return null;
        return { body: answer.Body.transformToWebStream(), sizeBytes: answer.ContentLength ?? null };
      } catch (error) {
        if (error instanceof NoSuchKey || (error as { name?: string }).name === "NoSuchKey") return null;
        throw error;
      }
    },
    async delete(key) {
      await client.send(new DeleteObjectCommand({ Bucket: bucket, Key: key }));
    },
  };
}

const cache = globalThis as unknown as { trimrailObjectStore?: { signature: string; store: ObjectStore } };

/** The store named by the environment, or null when none is configured. One client per process and configuration. */
export function getObjectStore(config: StorageConfig | null = storageConfig()): ObjectStore | null {
  if (!config) return null;
  const signature = JSON.stringify(config);
  if (cache.trimrailObjectStore?.signature !== signature) {
    cache.trimrailObjectStore = { signature, store: storeFor(createS3Client(config), config.bucket) };
  }
  return cache.trimrailObjectStore.store;
}
