import { fail, ok, type Result } from "@/lib/errors";
import { readCappedBody } from "./read-capped-body";

/** A page's form holds a few short fields; anything near this is not a person typing. */
export const MAX_FORM_BODY_BYTES = 64 * 1024;

const FORM_TYPE = /^(?:application\/x-www-form-urlencoded|multipart\/form-data)\s*(?:;|$)/i;

/**
 * Reads a browser's form post (urlencoded, or multipart as a browser sends it) as an object of each
 * field's first text value, under a size cap. Files in a multipart body are not fields and are dropped.
 * Any other type is a 415; a body that does not decode as its type a 400.
 */
export async function readFormBody(request: Request, maxBytes = MAX_FORM_BODY_BYTES): Promise<Result<Record<string, string>>> {
  const contentType = request.headers.get("content-type")?.trim() ?? "";
  if (!FORM_TYPE.test(contentType))
    return fail("unsupported_media_type", "Send the form as application/x-www-form-urlencoded or multipart/form-data.");
  const bytes = await readCappedBody(request, maxBytes);
  if (!bytes.ok) return bytes;
  let form: FormData;
  try {
    form = await new Response(new Uint8Array(bytes.data), { headers: { "content-type": contentType } }).formData();
  } catch {
    return fail("bad_request", "The form body could not be read as its content type says.");
  }
  const fields: Record<string, string> = {};
  for (const [key, value] of form) if (typeof value === "string" && !(key in fields)) fields[key] = value;
  return ok(fields);
}
