import { fail, ok, type Result } from "@/lib/errors";
import { readCappedBody } from "./read-capped-body";

export const MAX_JSON_BODY_BYTES = 256 * 1024;

const isJson = (contentType: string | null) =>
  contentType !== null && /^application\/(?:[\w.+-]+\+)?json\s*(?:;|$)/i.test(contentType.trim());

/**
 * Reads a JSON body under a size cap (413 past it, without reading the rest). Anything but JSON is a
 * 415; empty or malformed JSON a 400. Nothing of a refused body reaches a schema or the database.
 */
export async function readJsonBody(request: Request, maxBytes = MAX_JSON_BODY_BYTES): Promise<Result<unknown>> {
  if (!isJson(request.headers.get("content-type")))
    return fail("unsupported_media_type", "Send the body as JSON, with Content-Type: application/json.");
  const bytes = await readCappedBody(request, maxBytes);
  if (!bytes.ok) return bytes;
  const text = bytes.data.toString("utf8");
  if (text.trim() === "") return fail("bad_request", "The body is empty; send JSON.");
  try {
    return ok(JSON.parse(text) as unknown);
  } catch {
    return fail("bad_request", "The body is not valid JSON.");
  }
}
