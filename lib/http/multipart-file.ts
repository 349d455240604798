import "server-only";
import busboy from "busboy";
import { once } from "node:events";
import { createWriteStream } from "node:fs";
import { mkdtemp, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import { Readable } from "node:stream";
import type { ReadableStream as NodeReadableStream } from "node:stream/web";
import { fail, ok, type AppError, type Result } from "@/lib/errors";

// One file from a multipart/form-data body, streamed: the bytes go to a temporary file as they
// arrive, the size cap is checked on every chunk, and the file's first bytes are judged as soon as
// they are in. A refusal answers at once and stops reading the body: the rest of a huge or wrong
// upload is neither received nor kept, in memory or on disk.

export interface ReceivedFile {
  /** The name the sender gave (display only; never part of a storage key or a path). */
  fileName: string;
  sizeBytes: number;
  /** The temporary file holding the bytes; removed when `use` returns. */
  path: string;
}

export interface ReceiveFileOptions<H> {
  maxBytes: number;
  /** How many leading bytes `checkHead` needs (fewer when the file is shorter). */
  headBytes: number;
  /** Judges the file's first bytes; a failure refuses the upload before the rest is read. */
  checkHead: (head: Uint8Array) => Promise<Result<H>>;
  /** The message when the file passes `maxBytes`. */
  tooLargeMessage: string;
}

/** Multipart framing around one file: boundaries and part headers, far below this. */
const MULTIPART_OVERHEAD_BYTES = 16 * 1024;

/** Receives the body's one file, hands it with the head's verdict to `use`, and removes the temporary copy afterwards. */
export async function receiveSingleFile<H, T>(
  request: Request,
  options: ReceiveFileOptions<H>,
  consume: (file: ReceivedFile, head: H) => Promise<Result<T>>,
): Promise<Result<T>> {
  const contentType = request.headers.get("content-type") ?? "";
  if (!/^multipart\/form-data\s*;/i.test(contentType) || !request.body) {
    return fail("bad_request", "Send the file as multipart/form-data, one file per request.");
  }
  // A declared length already past the cap is refused before a byte of the file is looked at.
  const declared = Number(request.headers.get("content-length") ?? "NaN");
  if (Number.isFinite(declared) && declared > options.maxBytes + MULTIPART_OVERHEAD_BYTES)
    return fail("payload_too_large", options.tooLargeMessage);

  const source = Readable.fromWeb(request.body as NodeReadableStream<Uint8Array>);
  const dir = await mkdtemp(path.join(os.tmpdir(), "trimrail-upload-"));
  try {
    const received = await streamToFile(source, contentType, path.join(dir, "upload"), options);
    if (!received.ok) return received;
    return await consume(received.data.file, received.data.head);
  } finally {
    await rm(dir, { recursive: true, force: true });
  }
}

type Outcome<H> = Result<{ file: ReceivedFile; head: H }>;
type Refusal = { ok: false; error: AppError };

function streamToFile<H>(source: Readable, contentType: string, filePath: string, options: ReceiveFileOptions<H>): Promise<Outcome<H>> {
  return new Promise((resolve) => {
    let parser: busboy.Busboy;
    try {
      parser = busboy({
        headers: { "content-type": contentType },
        limits: { files: 1, fileSize: options.maxBytes, fields: 4, parts: 5 },
        defParamCharset: "utf8",
      });
    } catch {
      resolve(fail("bad_request", "The multipart body has no boundary."));
      return;
    }
    let settled = false;
    let filePart: Promise<Outcome<H>> | null = null;
    const settle = (result: Outcome<H>) => {
      if (settled) return;
      settled = true;
      if (!result.ok) {
        // Stop reading: nothing more is pulled from the socket, parsed or stored. The answer goes out
        // at once; the connection, its body left unread, is never reused, and Node drops it when
        // its keep-alive timeout passes (at once if the client asked for `Connection: close`).
        source.unpipe(parser);
        source.pause();
      }
      resolve(result);
    };

    parser.on("file", (_field, stream, info) => {
      const part = writeFilePart(stream, info.filename, filePath, options, { isSettled: () => settled, refuse: settle });
      filePart = part;
      void part.then((result) => {
        if (!result.ok) settle(result);
      });
    });
    parser.on("filesLimit", () => settle(fail("bad_request", "Send one file per request.")));
    parser.on("error", () => settle(fail("bad_request", "The multipart body could not be read.")));
    parser.on("close", () => {
      if (!filePart) settle(fail("bad_request", "The body holds no file."));
      else void filePart.then(settle);
    });
    source.on("error", () => settle(fail("bad_request", "The upload was interrupted.")));
    source.pipe(parser);
  });
}

async function writeFilePart<H>(
  stream: Readable & { truncated?: boolean },
  givenName: string | undefined,
  filePath: string,
  options: ReceiveFileOptions<H>,
  control: { isSettled: () => boolean; refuse: (refusal: Refusal) => void },
): Promise<Outcome<H>> {
  const tooLarge = (): Refusal => fail("payload_too_large", options.tooLargeMessage);
  // busboy stops passing bytes at the cap and says so: refuse right there, before the rest is read.
  stream.once("limit", () => control.refuse(tooLarge()));
  const out = createWriteStream(filePath);
  const headParts: Buffer[] = [];
  let headLength = 0;
  let verdict: Result<H> | null = null;
  let sizeBytes = 0;
  try {
    for await (const chunk of stream as AsyncIterable<Buffer>) {
      if (control.isSettled()) break;
      sizeBytes += chunk.byteLength;
      if (verdict === null) {
        headParts.push(chunk);
        headLength += chunk.byteLength;
        if (headLength >= options.headBytes) {
          verdict = await options.checkHead(Buffer.concat(headParts));
          if (!verdict.ok) return verdict;
        }
      }
      if (!out.write(chunk)) await once(out, "drain");
    }
    if (control.isSettled() || stream.truncated) return tooLarge();
    verdict ??= await options.checkHead(Buffer.concat(headParts));
    if (!verdict.ok) return verdict;
    out.end();
    await once(out, "finish");
    return ok({ file: { fileName: givenName ?? "", sizeBytes, path: filePath }, head: verdict.data });
  } catch {
    return fail("bad_request", "The upload was interrupted.");
  } finally {
    if (!out.writableFinished) out.destroy();
  }
}
