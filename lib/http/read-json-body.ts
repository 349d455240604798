import { fail, ok, type Result } from "@/lib/errors";

export const MAX_JSON_BODY_BYTES = 256 * 1024;

const isJson = (contentType: string | null) =>
  contentType !== null && /^application\/(?:[\w.+-]+\+)?json\s*(?:;|$)/i.test(contentType.trim());

/**
 * Reads a JSON body with a size cap that holds while it streams: at the cap it stops reading and
 * answers 413, so a huge or endless body never sits in memory. Anything but JSON is a 415; empty or
 * malformed JSON a 400. Nothing of a refused body reaches a schema or the database.
 */
export async function readJsonBody(request: Request, maxBytes = MAX_JSON_BODY_BYTES): Promise<Result<unknown>> {
  if (!isJson(request.headers.get("content-type")))
    return fail("unsupported_media_type", "Send the body as JSON, with Content-Type: application/json.");
  const tooLarge = () => fail("payload_too_large", `The body is larger than ${maxBytes} bytes.`);
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) return tooLarge();
  if (!request.body) return fail("bad_request", "The body is empty; send JSON.");

  const reader = request.body.getReader();
  const chunks: Uint8Array[] = [];
  let size = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    size += value.byteLength;
    if (size > maxBytes) {
      await reader.cancel().catch(() => undefined);
      return tooLarge();
    }
    chunks.push(value);
  }
  const text = Buffer.concat(chunks).toString("utf8");
  if (text.trim() === "") return fail("bad_request", "The body is empty; send JSON.");
  try {
    return ok(JSON.parse(text) as unknown);
  } catch {
    return fail("bad_request", "The body is not valid JSON.");
  }
}
