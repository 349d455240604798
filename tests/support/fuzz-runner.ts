import type { FuzzBody } from "./fuzz-bodies";

// Sends fuzz requests to the running server a few at a time and tallies what came back. A request
// that gets no answer at all (the connection dropped) is counted as status 0: it is as bad as a 5xx.

export interface FuzzRequest {
  method: string;
  /** Path and query, already encoded as wanted (junk segments are sent as given). */
  path: string;
  body: FuzzBody;
  headers: Record<string, string>;
  /** Whether a 2xx is a right answer to it (a pure calculation, or sign-out); otherwise only a 4xx is. */
  may2xx: boolean;
  /**
   * A junk address: fetch resolves dot segments (also `%2E%2E`) before sending, and Next answers
   * the shorter path's trailing slash with a 308, so a redirect is a right answer here too.
   */
  junkAddress: boolean;
  /** A form route refuses with a 303 back to its page: a redirect to where this matches is a refusal. */
  refusedTo?: RegExp;
}

export interface FuzzFailure {
  status: number;
  method: string;
  path: string;
  kind: string;
  sent: string;
  answer: string;
}

export interface FuzzTally {
  sent: number;
  byStatus: Record<number, number>;
  byKind: Record<string, number>;
  failures: FuzzFailure[];
  elapsedMs: number;
}

const preview = (text: string | Buffer | undefined, length = 160) =>
  text === undefined ? "(no body)" : `${text.toString().slice(0, length)}${text.length > length ? ` … (${text.length} bytes)` : ""}`;

async function sendOne(baseURL: string, request: FuzzRequest): Promise<{ status: number; answer: string; location: string | null }> {
  const headers: Record<string, string> = { ...request.headers };
  if (request.body.contentType !== null) headers["content-type"] = request.body.contentType;
  const bytes = request.body.bytes;
  try {
    const response = await fetch(`${baseURL}${request.path}`, {
      method: request.method,
      headers,
      // Bytes, never a string: fetch would add its own text/plain type to a string body.
      body: bytes === undefined ? undefined : new Uint8Array(typeof bytes === "string" ? Buffer.from(bytes) : bytes),
      redirect: "manual",
    });
    return { status: response.status, answer: await response.text(), location: response.headers.get("location") };
  } catch (error) {
    return { status: 0, answer: `no answer: ${(error as Error).cause ?? (error as Error).message}`, location: null };
  }
}

/** Sends every request, `concurrency` at a time, and counts the answers; wrong ones keep their details. */
export async function runFuzz(baseURL: string, requests: FuzzRequest[], concurrency = 8): Promise<FuzzTally> {
  const tally: FuzzTally = { sent: 0, byStatus: {}, byKind: {}, failures: [], elapsedMs: 0 };
  const started = performance.now();
  let next = 0;
  const worker = async () => {
    while (next < requests.length) {
      const request = requests[next];
      next += 1;
      const { status, answer, location } = await sendOne(baseURL, request);
      const refusedByRedirect = request.refusedTo !== undefined && location !== null && request.refusedTo.test(location);
      tally.sent += 1;
      tally.byStatus[status] = (tally.byStatus[status] ?? 0) + 1;
      tally.byKind[request.body.kind] = (tally.byKind[request.body.kind] ?? 0) + 1;
      const right =
        status >= 400 ? status < 500 : status >= 300 ? request.junkAddress || refusedByRedirect : status >= 200 && request.may2xx;
      if (!right)
        tally.failures.push({
          status,
          method: request.method,
          path: preview(request.path, 120),
          kind: request.body.kind,
          sent: preview(request.body.bytes),
          answer: preview(answer, 300),
        });
    }
  };
  await Promise.all(Array.from({ length: concurrency }, worker));
  tally.elapsedMs = performance.now() - started;
  return tally;
}
