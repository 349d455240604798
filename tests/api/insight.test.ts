import Papa from "papaparse";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/db/index";
import { ApiClient } from "../support/http";

const baseURL = inject("baseURL");
let database: ReturnType<typeof openDatabase>;
let maker: ApiClient;
let support: ApiClient;
let customer: ApiClient;

beforeAll(async () => {
  database = openDatabase(inject("databaseUrl"));
  maker = new ApiClient(baseURL);
  support = new ApiClient(baseURL);
  customer = new ApiClient(baseURL);
  expect((await maker.signIn("maker@trimrail.test")).status).toBe(200);
  expect((await support.signIn("support@trimrail.test")).status).toBe(200);
  expect((await customer.signIn("customer@trimrail.test")).status).toBe(200);
});
afterAll(() => database.client.close());

describe("GET /api/insight", () => {
  it("returns every figure to the maker and support, 403 to a customer and 401 to a stranger", async () => {
    const response = await maker.get("/api/insight");
    expect(response.status).toBe(200);
    const body = (await response.json()) as Record<string, unknown[]>;
    for (const key of [
      "payloadMassHistogram",
      "setupPayloadMassHistogram",
      "templateUsage",
      "railPosition",
      "freeLiftRatio",
      "flagCounts",
      "setupsPerMonth",
    ]) {
      expect(Array.isArray(body[key]), key).toBe(true);
    }
    const setups = Number((await database.client.execute("select count(*) as n from setups")).rows[0].n);
    expect((body.setupPayloadMassHistogram as Array<{ count: number }>).reduce((n, b) => n + b.count, 0)).toBe(setups);
    expect((await support.get("/api/insight")).status).toBe(200);
    expect((await customer.get("/api/insight")).status).toBe(403);
    expect((await new ApiClient(baseURL).get("/api/insight")).status).toBe(401);
  });

  it("returns only the model's setups when filtered by model, and 400 with the parameter for bad filters", async () => {
    const body = (await (await maker.get("/api/insight?model=mdl-ridge-06")).json()) as { railPosition: Array<{ modelId: string }> };
    expect(body.railPosition.every((r) => r.modelId === "mdl-ridge-06")).toBe(true);
    for (const [query, param] of [
      ["from=2026-13-01", "from"],
      ["to=yesterday", "to"],
      ["from=2026-11-30&to=2026-11-01", "from"],
      ["colour=red", ""],
    ]) {
      const response = await maker.get(`/api/insight?${query}`);
      expect(response.status, query).toBe(400);
      if (param)
        expect(
          (((await response.json()) as { error: { issues?: { path: string }[] } }).error.issues ?? []).map((i) => i.path),
          query,
        ).toContain(param);
    }
  });
});

describe("GET /api/insight/setups.csv", () => {
  it("returns one row per setup whose figures equal the database's, with SI units in the headers; maker only", async () => {
    const response = await maker.get("/api/insight/setups.csv");
    expect(response.status).toBe(200);
    expect(response.headers.get("content-type")).toMatch(/^text\/csv/);
    expect(response.headers.get("content-disposition")).toMatch(/^attachment; filename="trimrail-setups-\d{4}-\d{2}-\d{2}\.csv"$/);
    const parsed = Papa.parse<Record<string, string>>(await response.text(), { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual(
      expect.arrayContaining(["id", "mount_position_x_m", "payload_mass_kg", "free_lift_ratio", "wind_m_s", "created_at_utc"]),
    );
    const rows = (await database.client.execute("select id, mount_position_x_m, payload_mass_kg, status from setups order by id")).rows;
    expect(parsed.data.map((r) => r.id)).toEqual(rows.map((r) => String(r.id)));
    for (const [i, row] of rows.entries()) {
      expect(Number(parsed.data[i].mount_position_x_m)).toBe(Number(row.mount_position_x_m));
      expect(Number(parsed.data[i].payload_mass_kg)).toBe(Number(row.payload_mass_kg));
      expect(parsed.data[i].status).toBe(String(row.status));
    }
    expect((await support.get("/api/insight/setups.csv")).status).toBe(403);
    expect((await customer.get("/api/insight/setups.csv")).status).toBe(403);
  });
});
