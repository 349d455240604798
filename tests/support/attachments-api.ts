import { GetObjectCommand, ListObjectsV2Command, type S3Client } from "@aws-sdk/client-s3";
import { count, eq } from "drizzle-orm";
import http from "node:http";
import type { openDatabase } from "../../db/index";
import { attachments } from "../../db/schema";
import type { ApiClient } from "./http";

type Db = ReturnType<typeof openDatabase>["db"];

export interface AttachmentBody {
  id: string;
  setupId: string;
  fileName: string;
  contentType: string;
  kind: "image" | "pdf";
  sizeBytes: number;
  url: string;
  thumbnailUrl: string | null;
}

/** Uploads one file as a browser form would (fetch: Content-Length set, the type the "browser" claims). */
export async function uploadFile(
  client: ApiClient,
  setupId: string,
  file: { bytes: Uint8Array; name: string; claimedType?: string },
): Promise<Response> {
  const form = new FormData();
  form.append("file", new Blob([new Uint8Array(file.bytes)], { type: file.claimedType ?? "application/octet-stream" }), file.name);
  return client.upload(`/api/setups/${setupId}/attachments`, form);
}

export interface StreamedUploadOutcome {
  status: number | null;
  body: string;
  /** Bytes the client had handed to the socket when the answer came. */
  sentAtAnswerBytes: number | null;
  /** Bytes handed to the socket in all, until the end or the connection failed. */
  sentBytes: number;
  error: string | null;
}

/**
 * Streams a multipart upload of `fileBytes` bytes (chunked, no Content-Length, so only the
 * server's streaming check can stop it). By default it stops sending once the answer is in; with
 * `keepSending` it goes on, as a careless client would, until the server hangs up.
 */
export function streamUpload(
  baseURL: string,
  cookie: string,
  setupId: string,
  {
    fileBytes,
    start,
    fileName = "big.jpg",
    keepSending = false,
  }: { fileBytes: number; start: Buffer; fileName?: string; keepSending?: boolean },
): Promise<StreamedUploadOutcome> {
  const boundary = "----trimrail-stream-boundary";
  // A keep-alive connection, as browsers use (a client asking for "Connection: close" has the
  // server hang up right after its answer, which a sender still writing may meet as a reset before
  // reading the answer), but a pool of its own: a refused upload's connection is never reused.
  const agent = new http.Agent({ keepAlive: true, maxSockets: 1 });
  return new Promise((resolve) => {
    let sentBytes = 0;
    let sentAtAnswerBytes: number | null = null;
    let status: number | null = null;
    let body = "";
    let finished = false;
    const request = http.request(new URL(`/api/setups/${setupId}/attachments`, baseURL), {
      method: "POST",
      agent,
      headers: { cookie, origin: baseURL, "content-type": `multipart/form-data; boundary=${boundary}`, "transfer-encoding": "chunked" },
    });
    const finish = (error: string | null) => {
      if (finished) return;
      finished = true;
      request.destroy();
      agent.destroy();
      resolve({ status, body, sentAtAnswerBytes, sentBytes, error });
    };
    request.on("response", (response) => {
      status = response.statusCode ?? null;
      sentAtAnswerBytes = sentBytes;
      response.setEncoding("utf8");
      response.on("data", (text: string) => (body += text));
      response.on("end", () => {
        if (!keepSending) finish(null);
      });
      response.on("error", () => undefined);
    });
    request.on("error", (error) => finish(error.message));
    request.on("close", () => finish(null));
    request.write(
      `--${boundary}\r\ncontent-disposition: form-data; name="file"; filename="${fileName}"\r\ncontent-type: image/jpeg\r\n\r\n`,
    );
    const first = Buffer.alloc(64 * 1024, 0x5a);
    start.copy(first);
    const filler = Buffer.alloc(64 * 1024, 0x5a);
    let written = 0;
    const pump = () => {
      while (!finished && written < fileBytes) {
        const chunk = (written === 0 ? first : filler).subarray(0, Math.min(filler.length, fileBytes - written));
        written += chunk.length;
        sentBytes += chunk.length;
        if (!request.write(chunk)) {
          request.once("drain", pump);
          return;
        }
      }
      if (!finished) request.end(`\r\n--${boundary}--\r\n`);
    };
    pump();
  });
}

export async function countAttachmentRows(db: Db, setupId?: string): Promise<number> {
  const [{ n }] = setupId
    ? await db.select({ n: count() }).from(attachments).where(eq(attachments.setupId, setupId))
    : await db.select({ n: count() }).from(attachments);
  return n;
}

/** Every key in the fake's bucket (ListObjectsV2, paged). */
export async function listObjectKeys(s3: S3Client, bucket: string): Promise<string[]> {
  const keys: string[] = [];
  let token: string | undefined;
  do {
    const page = await s3.send(new ListObjectsV2Command({ Bucket: bucket, ContinuationToken: token }));
    keys.push(...(page.Contents ?? []).map((o) => o.Key ?? ""));
    token = page.IsTruncated ? page.NextContinuationToken : undefined;
  } while (token);
  return keys;
}

export async function readObject(s3: S3Client, bucket: string, key: string): Promise<{ bytes: Buffer; contentType: string | undefined }> {
  const answer = await s3.send(new GetObjectCommand({ Bucket: bucket, Key: key }));
  return { bytes: Buffer.from(await answer.Body!.transformToByteArray()), contentType: answer.ContentType };
}

export { processGroupRssBytes } from "./process-memory";
