import "server-only";
import type { z } from "zod";
import type { Viewer } from "@/lib/auth/access";
import type { Role } from "@/lib/domain";
import { errorResponse, issuesFromZod, type AppError, type Result } from "@/lib/errors";
import { readFormBody } from "@/lib/http/read-form-body";
import { readJsonBody } from "@/lib/http/read-json-body";
import { authorise } from "./authorise";
import { internalError } from "./internal-error";
import { crossSiteRefusal } from "./same-origin";
import { getViewer } from "./viewer";

type Schema<T> = z.ZodType<T>;

export interface RouteSpec<P, Q, B> {
  /** Who may call it; absent = any signed-in person. */
  roles?: readonly Role[];
  /** "public": no session needed (the handler gets a null viewer). Only for reads that reveal nothing. */
  access?: "signed-in" | "public";
  /** Path segments. A segment that does not parse is a 404: no such thing lives at that address. */
  params?: Schema<P>;
  /** Query string, as an object of its first values. */
  query?: Schema<Q>;
  /** JSON body (with `form`: the form's fields, each its first text value). */
  body?: Schema<B>;
  /**
   * A page's form post, so the page works without JavaScript: the body is urlencoded or multipart, the
   * core returns `{ location }` and the answer is 303 See Other there. Once the form is read, a failure
   * (bad fields, no session, the core's refusal) is a 303 to `failedTo` too, which gets the fields as typed.
   */
  form?: { failedTo: (error: AppError, fields: Record<string, string>) => string };
  /** The message when the path does not parse (e.g. "No such setup among yours."). */
  notFoundMessage?: string;
  /** Status of a success: 200 unless said; 204 answers no body. */
  status?: 200 | 201 | 204;
  /** "file": the core returns a FileBody and the answer is those bytes, not JSON. */
  respond?: "json" | "file";
}

/** What a core returns for a route that answers with a file. */
export interface FileBody {
  /**
   * The whole file; a stream of it (then give `sizeBytes` when it is known); or a function that
   * makes the bytes, called only when the client's copy (by `etag`) is stale.
   */
  bytes: Uint8Array | ReadableStream<Uint8Array> | (() => Promise<Uint8Array>);
  sizeBytes?: number | null;
  contentType: string;
  fileName: string;
  /** "attachment" makes the browser download it; "inline" may show it. */
  disposition: "attachment" | "inline";
  /** A strong validator of the bytes (quoted, e.g. "\"abc\""): a matching If-None-Match is answered 304. */
  etag?: string;
  /** Unset: "private, no-store". E.g. "private, no-cache" for a file that revalidates by its ETag. */
  cacheControl?: string;
}

/** If-None-Match lists ETags (or "*"); weak ones compare by their opaque part (RFC 9110 §13.1.2). */
function etagMatches(header: string | null, etag: string): boolean {
  if (!header) return false;
  const bare = (tag: string) => tag.trim().replace(/^W\//, "");
  return header.split(",").some((tag) => tag.trim() === "*" || bare(tag) === bare(etag));
}

async function fileResponse(file: FileBody, request: Request): Promise<Response> {
  const name = file.fileName.replace(/[^\w.-]+/g, "_");
  const cache = { "cache-control": file.cacheControl ?? "private, no-store", ...(file.etag ? { etag: file.etag } : {}) };
  if (file.etag && etagMatches(request.headers.get("if-none-match"), file.etag)) return new Response(null, { status: 304, headers: cache });
  const bytes = typeof file.bytes === "function" ? await file.bytes() : file.bytes;
  const length = bytes instanceof Uint8Array ? bytes.byteLength : file.sizeBytes;
  return new Response(bytes as BodyInit, {
    headers: {
      "content-type": file.contentType,
      ...(length === null || length === undefined ? {} : { "content-length": String(length) }),
      "content-disposition": `${file.disposition}; filename="${name}"`,
      "x-content-type-options": "nosniff",
      ...cache,
    },
  });
}

/** A form post's answer: the browser follows it with a GET (RFC 9110 §15.4.4), so a reload never posts again. */
const seeOther = (location: string) => new Response(null, { status: 303, headers: { location, "cache-control": "no-store" } });

export interface RouteArgs<P, Q, B, V = Viewer> {
  viewer: V;
  params: P;
  query: Q;
  body: B;
  request: Request;
}

interface NextRouteContext {
  params: Promise<unknown>;
}

function parsed<T>(schema: Schema<T>, value: unknown, error: (issues: ReturnType<typeof issuesFromZod>) => AppError): Result<T> {
  const outcome = schema.safeParse(value);
  return outcome.success ? { ok: true, data: outcome.data } : { ok: false, error: error(issuesFromZod(outcome.error)) };
}

/** Parses every part of the request the spec names, in path → query → body order (a form's fields are read already). */
async function parseRequest<P, Q, B>(
  spec: RouteSpec<P, Q, B>,
  request: Request,
  context: NextRouteContext,
  formFields: Record<string, string> | null,
): Promise<Result<{ params: P; query: Q; body: B }>> {
  const params = spec.params
    ? parsed(spec.params, await context.params, () => ({
        code: "not_found",
        message: spec.notFoundMessage ?? "Nothing is at this address.",
      }))
    : { ok: true as const, data: undefined as P };
  if (!params.ok) return params;
  const query = spec.query
    ? parsed(spec.query, Object.fromEntries(new URL(request.url).searchParams), (issues) => ({
        code: "bad_request",
        message: "The query string is not valid.",
        issues,
      }))
    : { ok: true as const, data: undefined as Q };
  if (!query.ok) return query;
  let body: Result<B> = { ok: true, data: undefined as B };
  if (spec.body) {
    const json = formFields ? { ok: true as const, data: formFields } : await readJsonBody(request);
    if (!json.ok) return json;
    body = parsed(spec.body, json.data, (issues) => ({ code: "bad_request", message: "The request body is not valid.", issues }));
    if (!body.ok) return body;
  }
  return { ok: true, data: { params: params.data, query: query.data, body: body.data } };
}

/**
 * The one way to write a route handler: refuse cross-site writes → parse (zod) → session → role →
 * the core function → its Result as JSON. Anything thrown is logged with a request id and answered as `internal`
 * (500) carrying that id, never as a raw database error.
 */
export function route<T, P = undefined, Q = undefined, B = undefined>(
  spec: RouteSpec<P, Q, B>,
  handler: (args: RouteArgs<P, Q, B>) => Promise<Result<T>>,
): (request: Request, context: NextRouteContext) => Promise<Response> {
  return async (request, context) => {
    try {
      const crossSite = crossSiteRefusal(request);
      if (crossSite) return errorResponse(crossSite);
      let formFields: Record<string, string> | null = null;
      if (spec.form) {
        const read = await readFormBody(request);
        if (!read.ok) return errorResponse(read.error);
        formFields = read.data;
      }
      const failure = (error: AppError) =>
        spec.form && formFields ? seeOther(spec.form.failedTo(error, formFields)) : errorResponse(error);
      const input = await parseRequest(spec, request, context, formFields);
      if (!input.ok) return failure(input.error);
      let viewer: Viewer | null = null;
      if (spec.access !== "public") {
        const allowed = authorise(await getViewer(), spec.roles);
        if (!allowed.ok) return failure(allowed.error);
        viewer = allowed.data;
      }
      const result = await handler({ viewer: viewer as Viewer, request, ...input.data });
      if (!result.ok) return failure(result.error);
      if (spec.form) return seeOther((result.data as { location: string }).location);
      if (spec.status === 204) return new Response(null, { status: 204 });
      if (spec.respond === "file") return await fileResponse(result.data as FileBody, request);
      return Response.json(result.data, { status: spec.status ?? 200 });
    } catch (error) {
      return errorResponse(internalError(error, `${request.method} ${new URL(request.url).pathname}`));
    }
  };
}
