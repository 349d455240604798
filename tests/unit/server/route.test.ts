import { afterEach, beforeEach, describe, expect, it, vi } from "vitest";
import { z } from "zod";
import type { Viewer } from "@/lib/auth/access";
import { fail, ok, type AppError } from "@/lib/errors";

// The wrapper alone, with the session replaced: what each step answers and in which order.
const session = vi.hoisted(() => ({ viewer: null as Viewer | null, reads: 0 }));
vi.mock("@/lib/server/viewer", () => ({
  getViewer: async () => {
    session.reads += 1;
    return session.viewer;
  },
}));
const { route } = await import("@/lib/server/route");

const CUSTOMER: Viewer = { id: "u-1", name: "Ada Customer", email: "ada@example.test", role: "customer", unitSystem: "metric" };
const MAKER: Viewer = { ...CUSTOMER, id: "u-9", role: "maker" };
const context = (params: Record<string, string> = {}) => ({ params: Promise.resolve(params) });
const post = (body: string, type = "application/json") =>
  new Request("http://app.test/api/things", { method: "POST", body, headers: { "content-type": type } });

beforeEach(() => {
  session.viewer = null;
  session.reads = 0;
});
afterEach(() => vi.restoreAllMocks());

describe("route", () => {
  const body = z.object({ count: z.number().int() });
  const handler = vi.fn(async ({ body: b }: { body: { count: number } }) => ok({ doubled: b.count * 2 }));
  const POST = route({ body, status: 201 }, handler);

  it("returns 400 with the field's path, before reading the session, when the body does not parse", async () => {
    session.viewer = CUSTOMER;
    const response = await POST(post(JSON.stringify({ count: "three" })), context());
    expect(response.status).toBe(400);
    const json = (await response.json()) as { error: { code: string; issues: { path: string }[] } };
    expect(json.error.code).toBe("bad_request");
    expect(json.error.issues.map((i) => i.path)).toEqual(["count"]);
    expect(session.reads).toBe(0);
  });

  it("returns 401 when a valid request has no session, without calling the core", async () => {
    handler.mockClear();
    const response = await POST(post(JSON.stringify({ count: 3 })), context());
    expect(response.status).toBe(401);
    expect(handler).not.toHaveBeenCalled();
  });

  it("returns the core's data with the spec's status when everything holds", async () => {
    session.viewer = CUSTOMER;
    const response = await POST(post(JSON.stringify({ count: 3 })), context());
    expect(response.status).toBe(201);
    expect(await response.json()).toEqual({ doubled: 6 });
  });

  it("returns 403 when the role is not among those allowed", async () => {
    session.viewer = CUSTOMER;
    const makerOnly = route({ roles: ["maker"] }, async () => ok({}));
    expect((await makerOnly(new Request("http://app.test/x"), context())).status).toBe(403);
    session.viewer = MAKER;
    expect((await makerOnly(new Request("http://app.test/x"), context())).status).toBe(200);
  });

  it("returns 404 with the spec's message when a path segment does not parse", async () => {
    session.viewer = CUSTOMER;
    const byId = route({ params: z.object({ id: z.string().max(4) }), notFoundMessage: "No such thing." }, async () => ok({}));
    const response = await byId(new Request("http://app.test/x"), context({ id: "much-too-long" }));
    expect(response.status).toBe(404);
    expect(((await response.json()) as { error: { message: string } }).error.message).toBe("No such thing.");
  });

  it("returns 400 for a query string that does not parse", async () => {
    session.viewer = CUSTOMER;
    const list = route({ query: z.object({ page: z.coerce.number().int().min(1) }) }, async ({ query }) => ok(query));
    expect((await list(new Request("http://app.test/x?page=0"), context())).status).toBe(400);
    expect(await (await list(new Request("http://app.test/x?page=2"), context())).json()).toEqual({ page: 2 });
  });

  it("returns the core's typed failure with its status", async () => {
    session.viewer = CUSTOMER;
    const conflicted = route({}, async () => fail("conflict", "Saved elsewhere."));
    const response = await conflicted(new Request("http://app.test/x"), context());
    expect(response.status).toBe(409);
    expect(await response.json()).toEqual({ error: { code: "conflict", message: "Saved elsewhere." } });
  });

  it("returns 204 with no body when the spec says so", async () => {
    session.viewer = CUSTOMER;
    const remove = route({ status: 204 }, async () => ok(null));
    const response = await remove(new Request("http://app.test/x", { method: "DELETE" }), context());
    expect(response.status).toBe(204);
    expect(await response.text()).toBe("");
  });

  it("returns a JSON 500 with a request id, and logs it, when the core throws", async () => {
    session.viewer = CUSTOMER;
    const log = vi.spyOn(console, "error").mockImplementation(() => undefined);
    const broken = route({}, async () => {
      throw new Error("SQLITE_CONSTRAINT: FOREIGN KEY constraint failed");
    });
    const response = await broken(new Request("http://app.test/api/broken"), context());
    expect(response.status).toBe(500);
    const json = (await response.json()) as { error: { code: string; message: string; requestId: string } };
    expect(json.error.code).toBe("internal");
    expect(json.error.requestId).toMatch(/^[0-9a-f]{8}$/);
    expect(json.error.message).toContain(json.error.requestId);
    expect(json.error.message).not.toMatch(/SQLITE|constraint/i);
    expect(String(log.mock.calls[0]?.[0])).toContain(json.error.requestId);
  });

  it("returns 400 for a body that is not JSON, and 413 for one over the cap", async () => {
    session.viewer = CUSTOMER;
    expect((await POST(post("{not json"), context())).status).toBe(400);
    expect((await POST(post(JSON.stringify({ count: 1, pad: "x".repeat(300 * 1024) })), context())).status).toBe(413);
  });

  it("returns 415 for a body that is not declared as JSON, and writes nothing", async () => {
    session.viewer = CUSTOMER;
    handler.mockClear();
    expect((await POST(post(JSON.stringify({ count: 1 }), "text/plain"), context())).status).toBe(415);
    expect((await POST(post(JSON.stringify({ count: 1 }), "application/x-www-form-urlencoded"), context())).status).toBe(415);
    expect((await POST(post(JSON.stringify({ count: 1 }), "application/json; charset=utf-8"), context())).status).toBe(201);
    expect(handler).toHaveBeenCalledTimes(1);
  });

  it("returns 403 for a write sent from another site, by Origin or by Sec-Fetch-Site", async () => {
    session.viewer = CUSTOMER;
    handler.mockClear();
    const from = (headers: Record<string, string>) =>
      new Request("http://app.test/api/things", {
        method: "POST",
        body: JSON.stringify({ count: 1 }),
        headers: { "content-type": "application/json", ...headers },
      });
    expect((await POST(from({ origin: "http://evil.example" }), context())).status).toBe(403);
    expect((await POST(from({ "sec-fetch-site": "cross-site" }), context())).status).toBe(403);
    expect((await POST(from({ "sec-fetch-site": "same-site" }), context())).status).toBe(403);
    expect(handler).not.toHaveBeenCalled();
    expect((await POST(from({ origin: "http://app.test" }), context())).status).toBe(201);
    expect((await POST(from({ "sec-fetch-site": "same-origin" }), context())).status).toBe(201);
  });

  it("returns 413 at the cap while a body without a length streams, without reading the rest", async () => {
    session.viewer = CUSTOMER;
    let pulled = 0;
    const chunk = new Uint8Array(64 * 1024).fill(32);
    const endless = new ReadableStream<Uint8Array>({
      pull(controller) {
        pulled += 1;
        controller.enqueue(chunk);
      },
    });
    const request = new Request("http://app.test/api/things", {
      method: "POST",
      body: endless,
      headers: { "content-type": "application/json" },
      duplex: "half",
    } as RequestInit);
    const response = await POST(request, context());
    expect(response.status).toBe(413);
    // 256 KiB cap / 64 KiB chunks: it stopped after a handful, not after the stream's (unbounded) end
    expect(pulled).toBeLessThan(10);
  });
});

describe("route with a form body", () => {
  const body = z.object({ name: z.string().trim().min(1, "Give it a name."), size: z.coerce.number().int().optional() });
  const core = vi.fn(async ({ body: b }: { body: { name: string } }) =>
    b.name === "taken" ? fail("conflict", "That name is taken.") : ok({ location: `/things/${encodeURIComponent(b.name)}` }),
  );
  const failedTo = vi.fn((error: AppError, fields: Record<string, string>) => `/things?code=${error.code}&name=${fields.name ?? ""}`);
  const POST = route({ body, form: { failedTo } }, core);
  const formPost = (form: string | FormData, headers: Record<string, string> = {}) =>
    new Request("http://app.test/api/forms/things", {
      method: "POST",
      body: form,
      headers: typeof form === "string" ? { "content-type": "application/x-www-form-urlencoded", ...headers } : headers,
    });

  beforeEach(() => {
    core.mockClear();
    failedTo.mockClear();
  });

  it("answers a good urlencoded post with 303 See Other to the core's location", async () => {
    session.viewer = CUSTOMER;
    const response = await POST(formPost("name=Kite+one&size=3"), context());
    expect(response.status).toBe(303);
    expect(response.headers.get("location")).toBe("/things/Kite%20one");
    expect(await response.text()).toBe("");
  });

  it("reads a multipart post as a browser sends it, first value of each field, files left out", async () => {
    session.viewer = CUSTOMER;
    const form = new FormData();
    form.append("name", "Kite two");
    form.append("name", "ignored second value");
    form.append("attachment", new Blob(["bytes"]), "a.bin");
    const response = await POST(formPost(form), context());
    expect(response.status).toBe(303);
    expect(response.headers.get("location")).toBe("/things/Kite%20two");
    expect(core.mock.calls[0]?.[0].body).toEqual({ name: "Kite two" });
  });

  it("sends bad fields back to failedTo with what was typed, before the session and without the core", async () => {
    session.viewer = CUSTOMER;
    const response = await POST(formPost("name=+++&size=x"), context());
    expect(response.status).toBe(303);
    expect(response.headers.get("location")).toMatch(/^\/things\?code=bad_request&name=/);
    const [error, fields] = failedTo.mock.calls[0] ?? [];
    expect(fields).toEqual({ name: "   ", size: "x" });
    expect(error?.issues?.map((i) => i.path).sort()).toEqual(["name", "size"]);
    expect(core).not.toHaveBeenCalled();
    expect(session.reads).toBe(0);
  });

  it("sends a stranger and the core's refusal to failedTo too", async () => {
    expect((await POST(formPost("name=Kite"), context())).headers.get("location")).toBe("/things?code=unauthenticated&name=Kite");
    expect(core).not.toHaveBeenCalled();
    session.viewer = CUSTOMER;
    expect((await POST(formPost("name=taken"), context())).headers.get("location")).toBe("/things?code=conflict&name=taken");
  });

  it("refuses JSON, a cross-site post and an oversized form with the typed errors, not a redirect", async () => {
    session.viewer = CUSTOMER;
    const json = await POST(formPost(JSON.stringify({ name: "Kite" }), { "content-type": "application/json" }), context());
    expect(json.status).toBe(415);
    expect(await POST(formPost("name=Kite", { origin: "http://evil.example" }), context()).then((r) => r.status)).toBe(403);
    expect(await POST(formPost("name=Kite", { "sec-fetch-site": "cross-site" }), context()).then((r) => r.status)).toBe(403);
    expect(await POST(formPost(`name=${"k".repeat(70 * 1024)}`), context()).then((r) => r.status)).toBe(413);
    const boundaryless = await POST(formPost("name=Kite", { "content-type": "multipart/form-data" }), context());
    expect(boundaryless.status).toBe(400);
    expect(core).not.toHaveBeenCalled();
    expect(failedTo).not.toHaveBeenCalled();
  });
});
