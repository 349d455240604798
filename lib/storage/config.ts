// Where attachments are kept: any S3-compatible store, read from the environment each time (tests
// and scripts set it per process). `npm run dev`, `npm run demo` and the e2e tests point these at
// the local fake (scripts/s3-fake.ts) unless S3_BUCKET names a real bucket.

export interface StorageConfig {
  bucket: string;
  region: string;
  /** Unset: the provider's own endpoint for the region (AWS). */
  endpoint: string | undefined;
  /** Unset: the SDK's usual credential chain (environment, profile, instance role). */
  credentials: { accessKeyId: string; secretAccessKey: string } | undefined;
  /** Bucket in the path (`endpoint/bucket/key`) rather than the host name; most self-hosted stores need it. */
  forcePathStyle: boolean;
}

export const DEFAULT_S3_REGION = "us-east-1";

type Env = Record<string, string | undefined>;

const truthy = (value: string | undefined) => ["1", "true", "yes"].includes((value ?? "").trim().toLowerCase());

/** The configured store, or null when S3_BUCKET is unset (then uploads answer 503). */
export function storageConfig(env: Env = process.env): StorageConfig | null {
  const bucket = env.S3_BUCKET?.trim();
  if (!bucket) return null;
  const accessKeyId = env.S3_ACCESS_KEY_ID?.trim();
  const secretAccessKey = env.S3_SECRET_ACCESS_KEY?.trim();
  return {
    bucket,
    region: env.S3_REGION?.trim() || DEFAULT_S3_REGION,
    endpoint: env.S3_ENDPOINT?.trim() || undefined,
    credentials: accessKeyId && secretAccessKey ? { accessKeyId, secretAccessKey } : undefined,
    forcePathStyle: truthy(env.S3_FORCE_PATH_STYLE),
  };
}
