import { fail, ok, type Result } from "@/lib/errors";

/**
 * Reads a request body with a size cap that holds while it streams: at the cap it stops reading and
 * answers 413, so a huge or endless body never sits in memory. An absent body reads as no bytes.
 */
export async function readCappedBody(request: Request, maxBytes: number): Promise<Result<Buffer>> {
  const tooLarge = () => fail("payload_too_large", `The body is larger than ${maxBytes} bytes.`);
  const declared = Number(request.headers.get("content-length") ?? "0");
  if (declared > maxBytes) return tooLarge();
  if (!request.body) return ok(Buffer.alloc(0));

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
  return ok(Buffer.concat(chunks));
}
