import { mkdir } from "node:fs/promises";
import path from "node:path";
import { pathToFileURL } from "node:url";
import S3rver from "s3rver";

// A local S3-compatible store for dev, demo and tests (s3rver): it listens on 127.0.0.1 and keeps
// objects as files under `dir`, so attachments work without a cloud account or the internet. The
// app talks to it through the same AWS SDK client and settings as to a real bucket.

/** s3rver's built-in account: it checks request signatures against this key pair. */
export const S3_FAKE_CREDENTIALS = { accessKeyId: "S3RVER", secretAccessKey: "S3RVER" } as const;
export const S3_FAKE_BUCKET = "trimrail-attachments";

export interface S3Fake {
  host: "127.0.0.1";
  port: number;
  dir: string;
  bucket: string;
  endpoint: string;
  /** The S3_* variables that point the app (lib/storage/config.ts) at this fake. */
  env: Record<string, string>;
  stop: () => Promise<void>;
}

export interface S3FakeOptions {
  /** 0 or unset: a free port. */
  port?: number;
  dir: string;
  bucket?: string;
}

/** Starts the fake with its bucket made; resolves once it listens. */
export async function startS3Fake({ port = 0, dir, bucket = S3_FAKE_BUCKET }: S3FakeOptions): Promise<S3Fake> {
  const folder = path.resolve(dir);
  await mkdir(folder, { recursive: true });
  const server = new S3rver({ address: "127.0.0.1", port, directory: folder, silent: true, configureBuckets: [{ name: bucket }] });
  const address = await server.run();
  const endpoint = `http://127.0.0.1:${address.port}`;
  return {
    host: "127.0.0.1",
    port: address.port,
    dir: folder,
    bucket,
    endpoint,
    env: {
      S3_ENDPOINT: endpoint,
      S3_REGION: "us-east-1",
      S3_BUCKET: bucket,
      S3_ACCESS_KEY_ID: S3_FAKE_CREDENTIALS.accessKeyId,
      S3_SECRET_ACCESS_KEY: S3_FAKE_CREDENTIALS.secretAccessKey,
      S3_FORCE_PATH_STYLE: "true",
    },
    stop: () => server.close(),
  };
}

function argument(name: string): string | undefined {
  const index = process.argv.indexOf(`--${name}`);
  return index >= 0 ? process.argv[index + 1] : undefined;
}

// CLI: `npx tsx scripts/s3-fake.ts [--port 4569] [--dir data/s3]`
if (process.argv[1] && import.meta.url === pathToFileURL(path.resolve(process.argv[1])).href) {
  const fake = await startS3Fake({
    port: Number(argument("port") ?? process.env.TRIMRAIL_S3_FAKE_PORT ?? 0),
    dir: argument("dir") ?? process.env.TRIMRAIL_S3_DIR ?? path.join("data", "s3"),
  });
  console.log(`[s3-fake] listening on ${fake.endpoint}, keeping objects in ${fake.dir}`);
  console.log(
    `[s3-fake] point the app at it with ${Object.entries(fake.env)
      .map(([k, v]) => `${k}=${v}`)
      .join(" ")}`,
  );
  for (const signal of ["SIGINT", "SIGTERM"] as const) process.on(signal, () => void fake.stop().then(() => process.exit(0)));
}
