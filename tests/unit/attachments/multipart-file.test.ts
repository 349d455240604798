import { readFile } from "node:fs/promises";
import { describe, expect, it } from "vitest";
import { ok, fail } from "@/lib/errors";
import { receiveSingleFile } from "@/lib/http/multipart-file";

// The streamed receiver on its own, fed by a body that counts how much of it was ever pulled.

const MAX_BYTES = 1024 * 1024;
const BOUNDARY = "----trimrail-test-boundary";
const CHUNK_BYTES = 16 * 1024;

interface CountingBody {
  body: ReadableStream<Uint8Array>;
  pulledBytes: () => number;
  /** Lets a body held at `holdAfterBytes` go on. */
  release: () => void;
}

/** A multipart body of one file of `fileBytes` bytes (first bytes `start`), produced only as it is read. */
function countingMultipart(fileBytes: number, start: Buffer, fileName = "photo.jpg", holdAfterBytes = Infinity): CountingBody {
  const head = Buffer.from(
    `--${BOUNDARY}\r\ncontent-disposition: form-data; name="file"; filename="${fileName}"\r\ncontent-type: image/jpeg\r\n\r\n`,
  );
  const tail = Buffer.from(`\r\n--${BOUNDARY}--\r\n`);
  let pulled = 0;
  let fileSent = 0;
  let phase: "head" | "file" | "tail" | "done" = "head";
  let release = () => {};
  const released = new Promise<void>((resolve) => (release = resolve));
  const body = new ReadableStream<Uint8Array>({
    // One chunk per turn of the event loop, as from a socket: a reader that stops is seen to stop.
    async pull(controller) {
      await new Promise((r) => setImmediate(r));
      // A sender that has more to send but has not sent it yet: the answer must not wait for it.
      if (pulled >= holdAfterBytes) await released;
      let chunk: Buffer;
      if (phase === "head") {
        chunk = head;
        phase = "file";
      } else if (phase === "file") {
        const size = Math.min(CHUNK_BYTES, fileBytes - fileSent);
        chunk = Buffer.alloc(size, 0x41);
        if (fileSent === 0) start.copy(chunk, 0, 0, Math.min(start.length, size));
        fileSent += size;
        if (fileSent >= fileBytes) phase = "tail";
      } else if (phase === "tail") {
        chunk = tail;
        phase = "done";
      } else {
        controller.close();
        return;
      }
      pulled += chunk.length;
      controller.enqueue(new Uint8Array(chunk));
    },
  });
  return { body, pulledBytes: () => pulled, release };
}

const requestWith = (body: ReadableStream<Uint8Array>) =>
  new Request("http://test.invalid/upload", {
    method: "POST",
    body,
    headers: { "content-type": `multipart/form-data; boundary=${BOUNDARY}` },
    duplex: "half",
  } as RequestInit);

const JPEG_START = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00]);
const options = {
  maxBytes: MAX_BYTES,
  headBytes: 64,
  tooLargeMessage: "too large",
  checkHead: async (head: Uint8Array) => (head[0] === 0xff && head[1] === 0xd8 ? ok("jpeg") : fail("unsupported_media_type", "not a jpeg")),
};

describe("receiveSingleFile", () => {
  it("returns the file as written to a temporary file, with its name and size", async () => {
    const { body } = countingMultipart(200_000, JPEG_START, "field day.jpg");
    const result = await receiveSingleFile(requestWith(body), options, async (file, verdict) =>
      ok({ ...file, verdict, bytes: await readFile(file.path) }),
    );
    expect(result.ok).toBe(true);
    if (!result.ok) return;
    expect(result.data.fileName).toBe("field day.jpg");
    expect(result.data.sizeBytes).toBe(200_000);
    expect(result.data.bytes.length).toBe(200_000);
    expect(result.data.bytes.subarray(0, JPEG_START.length).equals(JPEG_START)).toBe(true);
    expect(result.data.verdict).toBe("jpeg");
  });

  it("returns 413 as the cap passes, without waiting for the rest, and reads no further", async () => {
    // The body holds just past the cap: the answer has to come from what is in.
    const counting = countingMultipart(40 * MAX_BYTES, JPEG_START, "photo.jpg", MAX_BYTES + 128 * 1024);
    const result = await receiveSingleFile(requestWith(counting.body), options, async () => ok(null));
    expect(result).toMatchObject({ ok: false, error: { code: "payload_too_large" } });
    const atAnswer = counting.pulledBytes();
    expect(atAnswer).toBeLessThan(MAX_BYTES + 256 * 1024);
    // The sender goes on, but nothing more is read (a stream queue's worth at most).
    counting.release();
    await new Promise((r) => setTimeout(r, 300));
    expect(counting.pulledBytes() - atAnswer).toBeLessThan(128 * 1024);
  });

  it("returns 415 from the first bytes, before the rest of the body is read", async () => {
    const counting = countingMultipart(40 * MAX_BYTES, Buffer.from("<!doctype html><html>"), "innocent.png", 128 * 1024);
    const result = await receiveSingleFile(requestWith(counting.body), options, async () => ok(null));
    expect(result).toMatchObject({ ok: false, error: { code: "unsupported_media_type" } });
    expect(counting.pulledBytes()).toBeLessThan(256 * 1024);
    counting.release();
  });

  it("returns 413 before reading when the declared length is already past the cap", async () => {
    const counting = countingMultipart(2 * MAX_BYTES, JPEG_START);
    const request = new Request("http://test.invalid/upload", {
      method: "POST",
      body: counting.body,
      headers: { "content-type": `multipart/form-data; boundary=${BOUNDARY}`, "content-length": String(2 * MAX_BYTES) },
      duplex: "half",
    } as RequestInit);
    expect(await receiveSingleFile(request, options, async () => ok(null))).toMatchObject({
      ok: false,
      error: { code: "payload_too_large" },
    });
    expect(counting.pulledBytes()).toBeLessThan(64 * 1024);
  });

  it("returns 400 for a body that is not multipart or holds no file", async () => {
    const json = new Request("http://test.invalid/upload", { method: "POST", body: "{}", headers: { "content-type": "application/json" } });
    expect(await receiveSingleFile(json, options, async () => ok(null))).toMatchObject({ ok: false, error: { code: "bad_request" } });
    const empty = new Request("http://test.invalid/upload", {
      method: "POST",
      body: `--${BOUNDARY}--\r\n`,
      headers: { "content-type": `multipart/form-data; boundary=${BOUNDARY}` },
    });
    expect(await receiveSingleFile(empty, options, async () => ok(null))).toMatchObject({
      ok: false,
      error: { code: "bad_request", message: "The body holds no file." },
    });
  });
});
