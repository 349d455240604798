import type { z } from "zod";
import { fail, issuesFromZod, ok, type Result } from "@/lib/errors";

export const MAX_JSON_BODY_BYTES = 256 * 1024;

/**
 * Reads a JSON body with a size cap, so a huge or malformed body is a 413/400 with a message and
 * never reaches a schema or the database.
 */
export async function readJsonBody(request: Request, maxBytes = MAX_JSON_BODY_BYTES): Promise<Result<unknown>> {
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) return fail("payload_too_large", `The body is larger than ${maxBytes} bytes.`);
  const text = await request.text();
  if (Buffer.byteLength(text, "utf8") > maxBytes) return fail("payload_too_large", `The body is larger than ${maxBytes} bytes.`);
  if (text.trim() === "") return fail("bad_request", "The body is empty; send JSON.");
  try {
    return ok(JSON.parse(text) as unknown);
  } catch {
    return fail("bad_request", "The body is not valid JSON.");
  }
}

/** Reads a JSON body and validates it; bad JSON, a huge body or a schema failure is a typed 4xx. */
export async function readValidBody<T>(
  request: Request,
  schema: { safeParse: (data: unknown) => { success: true; data: T } | { success: false; error: z.ZodError } },
  message: string,
): Promise<Result<T>> {
  const body = await readJsonBody(request);
  if (!body.ok) return body;
  const parsed = schema.safeParse(body.data);
  return parsed.success ? ok(parsed.data) : fail("bad_request", message, issuesFromZod(parsed.error));
}
