import path from "node:path";
import { startS3Fake, type S3Fake } from "./s3-fake";

/**
 * For `npm run dev` and `npm run demo`: unless S3_BUCKET names a real bucket, starts the local S3
 * fake in this process and puts the S3_* variables that reach it into process.env for the Next
 * server it spawns. Objects persist under data/s3 beside the database.
 */
export async function startLocalStorage(): Promise<S3Fake | null> {
  if (process.env.S3_BUCKET) {
    console.log(`[trimrail] attachments go to the bucket in S3_BUCKET (${process.env.S3_BUCKET})`);
    return null;
  }
  const fake = await startS3Fake({
    port: Number(process.env.TRIMRAIL_S3_FAKE_PORT ?? 0),
    dir: process.env.TRIMRAIL_S3_DIR ?? path.join("data", "s3"),
  });
  Object.assign(process.env, fake.env);
  console.log(`[trimrail] attachments are kept by the local S3 fake on ${fake.endpoint} in ${fake.dir}`);
  return fake;
}
