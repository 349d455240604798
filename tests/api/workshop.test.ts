import { beforeAll, describe, expect, inject, it } from "vitest";
import { DEMO_MOUNTS } from "../../db/seed-data";
import { ApiClient } from "../support/http";

// The Workshop's routes over HTTP against the running app: who may call them, what bad input
// answers, the GLB route's ETag, and retiring as a new setup sees it.

const baseURL = inject("baseURL");
let maker: ApiClient;
let support: ApiClient;
let customer: ApiClient;

beforeAll(async () => {
  maker = new ApiClient(baseURL);
  support = new ApiClient(baseURL);
  customer = new ApiClient(baseURL);
  expect((await maker.signIn("maker@trimrail.test")).status).toBe(200);
  expect((await support.signIn("support@trimrail.test")).status).toBe(200);
  expect((await customer.signIn("customer@trimrail.test")).status).toBe(200);
});

const LITE = DEMO_MOUNTS.find((m) => m.id === "mnt-slider-lite")!;
const { id: _liteId, ...LITE_VALUES } = LITE;

describe("/api/catalogue roles", () => {
  it("answers 401 to a stranger and 403 to support and customers on every Workshop write", async () => {
    const stranger = new ApiClient(baseURL);
    expect((await stranger.get("/api/catalogue/mounts")).status).toBe(401);
    for (const client of [support, customer]) {
      expect((await client.get("/api/catalogue/mounts")).status).toBe(403);
      expect((await client.request("PUT", "/api/catalogue/mounts/mnt-slider-lite", LITE_VALUES)).status).toBe(403);
      expect((await client.request("PUT", "/api/catalogue/models/mdl-ridge-06/active", { active: false })).status).toBe(403);
      expect((await client.request("POST", "/api/catalogue/templates/import", { csv: "x" })).status).toBe(403);
    }
  });

  it("lists a page of mounts with each one's usage for the maker", async () => {
    const response = await maker.get("/api/catalogue/mounts?page=1");
    expect(response.status).toBe(200);
    const body = (await response.json()) as { rows: { id: string; setupCount: number }[]; total: number; pageSize: number };
    expect(body.total).toBe(DEMO_MOUNTS.length);
    expect(body.rows.find((r) => r.id === "mnt-slider-14")!.setupCount).toBeGreaterThan(0);
    expect((await maker.get("/api/catalogue/mounts?page=0")).status).toBe(400);
  });
});

describe("bad input", () => {
  it("answers 400 with the field paths and writes nothing", async () => {
    const response = await maker.request("PUT", "/api/catalogue/mounts/mnt-slider-lite", { ...LITE_VALUES, ratedLoadKg: -1, thread: "M6" });
    expect(response.status).toBe(400);
    const { error } = (await response.json()) as { error: { issues: { path: string }[] } };
    expect(error.issues.map((i) => i.path).sort()).toEqual(["ratedLoadKg", "thread"]);
    const list = (await (await maker.get("/api/catalogue/mounts")).json()) as { rows: { id: string; ratedLoadKg: number }[] };
    expect(list.rows.find((r) => r.id === "mnt-slider-lite")!.ratedLoadKg).toBe(LITE.ratedLoadKg);
  });

  it("answers 400 for a hull preview that is not JSON or not a hull, never a 500", async () => {
    expect((await maker.get("/api/catalogue/hull-preview.glb?hull=%7Bnope")).status).toBe(400);
    const tooThin = await maker.get(
      `/api/catalogue/hull-preview.glb?hull=${encodeURIComponent(JSON.stringify({ lengthM: 2, maxDiameterM: 0.001, maxDiameterAtFraction: 0.4 }))}`,
    );
    expect(tooThin.status).toBe(400);
    const { error } = (await tooThin.json()) as { error: { issues: { path: string }[] } };
    expect(error.issues[0].path).toBe("hull.maxDiameterM");
  });

  it("answers 409 to a duplicate name and to deleting a mount that setups use", async () => {
    const duplicate = await maker.request("POST", "/api/catalogue/mounts", { ...LITE_VALUES });
    expect(duplicate.status).toBe(409);
    const used = await maker.request("DELETE", "/api/catalogue/mounts/mnt-slider-14");
    expect(used.status).toBe(409);
  });

  it("answers 422 to an import with one bad row, naming row and column, and imports nothing", async () => {
    const before = (await (await maker.get("/api/catalogue/templates")).json()) as { total: number };
    const csv =
      "name,category,mass_kg,shape,length_m,width_m,height_m,attachment,drag_area_m2,offset_x_m,offset_z_m\nGood,light,0.02,box,0.02,0.02,0.02,strap,0,0,-0.05\nBad,light,0.02,box,0.02,0.02,0.02,glue,0,0,-0.05";
    const response = await maker.request("POST", "/api/catalogue/templates/import", { csv });
    expect(response.status).toBe(422);
    const { error } = (await response.json()) as { error: { detail: { problems: { row: number; field: string }[] } } };
    expect(error.detail.problems.map((p) => `${p.row}:${p.field}`)).toEqual(["3:attachment"]);
    const after = (await (await maker.get("/api/catalogue/templates")).json()) as { total: number };
    expect(after.total).toBe(before.total);
  });
});

describe("GET /api/catalogue/models/:id/envelope.glb", () => {
  it("answers the GLB built from the stored hull with an ETag, and 304 when it is unchanged", async () => {
    const first = await customer.get("/api/catalogue/models/mdl-ridge-11/envelope.glb");
    expect(first.status).toBe(200);
    expect(first.headers.get("content-type")).toBe("model/gltf-binary");
    const etag = first.headers.get("etag");
    expect(etag).toMatch(/^"[\w-]+"$/);
    const bytes = new Uint8Array(await first.arrayBuffer());
    expect(new TextDecoder().decode(bytes.subarray(0, 4))).toBe("glTF");
    const again = await customer.request("GET", "/api/catalogue/models/mdl-ridge-11/envelope.glb", undefined, { "if-none-match": etag! });
    expect(again.status).toBe(304);
    expect(again.headers.get("etag")).toBe(etag);
    expect((await customer.get("/api/catalogue/models/nope/envelope.glb")).status).toBe(404);
  });
});

describe("retiring", () => {
  it("hides a retired mount from a new setup while a setup that uses it still opens and saves", async () => {
    expect((await maker.request("PUT", "/api/catalogue/mounts/mnt-slider-lite/active", { active: false })).status).toBe(200);
    try {
      const old = await customer.get("/api/setups/set-wren-heavy");
      expect(old.status).toBe(200);
      const { draft, version } = (await old.json()) as { draft: Record<string, unknown>; version: number };
      expect((await customer.request("PUT", "/api/setups/set-wren-heavy", { version, draft })).status).toBe(200);
      const fresh = await customer.request("POST", "/api/setups", { draft: { ...draft, name: "Copy by hand" } });
      expect(fresh.status).toBe(400);
      const { error } = (await fresh.json()) as { error: { issues: { path: string; message: string }[] } };
      expect(error.issues).toEqual([{ path: "draft.mountId", message: "retired mount" }]);
    } finally {
      expect((await maker.request("PUT", "/api/catalogue/mounts/mnt-slider-lite/active", { active: true })).status).toBe(200);
    }
  });
});
