import fc from "fast-check";
import type { FuzzBody } from "./fuzz-bodies";

// Multipart/form-data bodies for an upload route, each one wrong in its framing or its file: bad
// or missing boundaries, no file, two files, huge part headers, cut short, or file bytes that are
// no photo or PDF. None carries a file the route could accept, so none may be stored.

const CRLF = "\r\n";

/** File bytes that no sniffer takes for a photo or a PDF ("ZZ" starts no known format). */
const junkFile = (bytes: Uint8Array) => Buffer.concat([Buffer.from("ZZ"), Buffer.from(bytes)]);
/** The first bytes of a JPEG or a PNG, then garbage: a decoder must refuse them. */
const JPEG_START = Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0x00, 0x10, 0x4a, 0x46, 0x49, 0x46, 0x00]);
const PNG_START = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);

interface Part {
  headers: string[];
  body: Buffer;
}

const filePart = (body: Buffer, { name = "file", filename = "photo.jpg", type = "image/jpeg" } = {}): Part => ({
  headers: [`Content-Disposition: form-data; name="${name}"; filename="${filename}"`, `Content-Type: ${type}`],
  body,
});
const fieldPart = (name: string, value: string): Part => ({
  headers: [`Content-Disposition: form-data; name="${name}"`],
  body: Buffer.from(value),
});

function frame(boundary: string, parts: Part[], { close = true } = {}): Buffer {
  const chunks: Buffer[] = [];
  for (const part of parts) {
    chunks.push(Buffer.from(`--${boundary}${CRLF}${part.headers.join(CRLF)}${CRLF}${CRLF}`), part.body, Buffer.from(CRLF));
  }
  if (close) chunks.push(Buffer.from(`--${boundary}--${CRLF}`));
  return Buffer.concat(chunks);
}

const multipart = (kind: string, boundary: string, bytes: Buffer, header = `multipart/form-data; boundary=${boundary}`): FuzzBody => ({
  kind: `multipart: ${kind}`,
  contentType: header,
  bytes,
});

/** The hand-made framings, one of each kind of wrong. */
function handMade(): FuzzBody[] {
  const b = "----fuzz-boundary";
  const file = junkFile(Buffer.alloc(2048, 0x41));
  const one = frame(b, [filePart(file)]);
  return [
    multipart("no boundary parameter", b, one, "multipart/form-data"),
    multipart("empty boundary", b, one, "multipart/form-data; boundary="),
    multipart("boundary not in the body", b, one, "multipart/form-data; boundary=something-else"),
    multipart("boundary of 200 characters", "x".repeat(200), frame("x".repeat(200), [filePart(file)])),
    multipart("quoted boundary with spaces", "a b c", frame("a b c", [filePart(file)]), 'multipart/form-data; boundary="a b c"'),
    multipart("unicode boundary", "grenze-ü", frame("grenze-ü", [filePart(file)])),
    multipart("no parts", b, Buffer.from(`--${b}--${CRLF}`)),
    multipart("empty body", b, Buffer.alloc(0)),
    multipart("only a text field", b, frame(b, [fieldPart("note", "hello")])),
    multipart(
      "five text fields",
      b,
      frame(
        b,
        [1, 2, 3, 4, 5].map((i) => fieldPart(`f${i}`, "x")),
      ),
    ),
    multipart("two files", b, frame(b, [filePart(file), filePart(file, { filename: "second.jpg" })])),
    multipart("two files, the first empty", b, frame(b, [filePart(Buffer.alloc(0)), filePart(file)])),
    multipart("empty file", b, frame(b, [filePart(Buffer.alloc(0))])),
    multipart("file without a filename", b, frame(b, [{ headers: ['Content-Disposition: form-data; name="file"'], body: file }])),
    multipart("part without headers", b, frame(b, [{ headers: [], body: file }])),
    multipart("part header of 100 KB", b, frame(b, [filePart(file, { filename: `${"n".repeat(100_000)}.jpg` })])),
    multipart(
      "1,000 part headers",
      b,
      frame(b, [
        { ...filePart(file), headers: [...filePart(file).headers, ...Array.from({ length: 1000 }, (_, i) => `X-Extra-${i}: ${i}`)] },
      ]),
    ),
    multipart("path in the filename", b, frame(b, [filePart(file, { filename: "../../../etc/passwd" })])),
    multipart("NUL in the filename", b, frame(b, [filePart(file, { filename: "a\u0000b.jpg" })])),
    multipart("cut before the closing boundary", b, frame(b, [filePart(file)], { close: false })),
    multipart("cut in a part header", b, Buffer.from(`--${b}${CRLF}Content-Disposition: form-da`)),
    multipart("JPEG start then garbage", b, frame(b, [filePart(Buffer.concat([JPEG_START, Buffer.alloc(4096, 0x13)]))])),
    multipart(
      "PNG start then garbage",
      b,
      frame(b, [filePart(Buffer.concat([PNG_START, Buffer.alloc(4096, 0x13)]), { filename: "x.png", type: "image/png" })]),
    ),
    multipart("claims PDF, is not", b, frame(b, [filePart(file, { filename: "sheet.pdf", type: "application/pdf" })])),
    multipart(
      "LF line ends",
      b,
      Buffer.from(
        frame(b, [filePart(file)])
          .toString("latin1")
          .replaceAll(CRLF, "\n"),
        "latin1",
      ),
    ),
    { kind: "multipart: mixed instead of form-data", contentType: `multipart/mixed; boundary=${b}`, bytes: one },
    { kind: "multipart: form-urlencoded", contentType: "application/x-www-form-urlencoded", bytes: "file=abc" },
  ];
}

/** Framings fast-check varies: boundary, part headers, the number and kind of parts, and where the body is cut. */
function generatedFramings(seed: number, count: number): FuzzBody[] {
  const boundaryArb = fc.oneof(fc.stringMatching(/^[A-Za-z0-9'()+_,./:=?-]{1,70}$/), fc.string({ minLength: 0, maxLength: 90 }));
  const headerArb = fc.oneof(
    fc.constant('Content-Disposition: form-data; name="file"; filename="f.jpg"'),
    fc.string({ maxLength: 300 }).map((s) => `Content-Disposition: ${s}`),
    fc.string({ maxLength: 60 }).map((s) => `Content-Type: ${s}`),
    fc.string({ maxLength: 200 }),
  );
  const partArb = fc.record({
    headers: fc.array(headerArb, { maxLength: 4 }),
    body: fc.oneof(
      fc.uint8Array({ maxLength: 3000 }).map(junkFile),
      fc.uint8Array({ maxLength: 3000 }).map((bytes) => Buffer.concat([JPEG_START, Buffer.from(bytes)])),
      fc.string({ maxLength: 200 }).map((s) => Buffer.from(s)),
    ),
  });
  const bodyArb = fc.record({
    boundary: boundaryArb,
    headerBoundary: fc.option(boundaryArb, { nil: undefined }),
    parts: fc.array(partArb, { maxLength: 4 }),
    close: fc.boolean(),
    cutAt: fc.option(fc.nat(), { nil: undefined }),
  });
  return fc.sample(bodyArb, { numRuns: count, seed }).map(({ boundary, headerBoundary, parts, close, cutAt }) => {
    const full = frame(boundary, parts, { close });
    const bytes = cutAt === undefined ? full : full.subarray(0, cutAt % (full.length + 1));
    return multipart("generated framing", boundary, bytes, `multipart/form-data; boundary=${headerBoundary ?? boundary}`);
  });
}

/** At least `count` multipart bodies of which none holds a file the route could store. */
export function multipartBodies({ seed, count }: { seed: number; count: number }): FuzzBody[] {
  const fixed = handMade();
  return [...fixed, ...generatedFramings(seed, Math.max(0, count - fixed.length))];
}
