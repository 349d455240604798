import { S3Client } from "@aws-sdk/client-s3";
import type { StorageConfig } from "./config";

/**
 * An S3 client for a store. The checksum settings matter: with the SDK's default ("when
 * supported") a streamed PutObject is sent with aws-chunked framing and a trailing checksum, which
 * some S3-compatible stores (the local fake among them) keep as part of the object's bytes.
 */
export function createS3Client(config: StorageConfig): S3Client {
  return new S3Client({
    region: config.region,
    endpoint: config.endpoint,
    forcePathStyle: config.forcePathStyle,
    credentials: config.credentials,
    requestChecksumCalculation: "WHEN_REQUIRED",
    responseChecksumValidation: "WHEN_REQUIRED",
    // A store that does not answer should fail an upload in seconds, not hang it.
    requestHandler: { connectionTimeout: 5_000, requestTimeout: 60_000 },
  });
}
