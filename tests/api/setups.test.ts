import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/db/index";
import { evaluateBalance, worstLevel, type BalanceResult, type FlagLevel } from "@/lib/balance";
import { toBalanceInput, type SetupCatalogue } from "@/lib/setups/balance-input";
import type { SetupDraft } from "@/lib/setups/setup-draft";
import { ApiClient } from "../support/http";
import { catalogueFor as sharedCatalogueFor } from "../support/setup-fixtures";
import { signUpAndVerify } from "../support/sign-up";

const baseURL = inject("baseURL");
const asJson = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

interface StoredSetupBody {
  id: string;
  version: number;
  status: string;
  draft: SetupDraft;
  result: BalanceResult;
  worstFlag: FlagLevel;
}
interface ErrorBody {
  error: { code: string; message: string; issues?: Array<{ path: string; message: string }> };
}

let database: ReturnType<typeof openDatabase>;
let customer: ApiClient;

beforeAll(async () => {
  database = openDatabase(inject("databaseUrl"));
  customer = new ApiClient(baseURL);
  expect((await customer.signIn("customer@trimrail.test")).status).toBe(200);
});
afterAll(() => database.client.close());

/** The catalogue rows a draft names, read straight from the database (not through the app's queries). */
const catalogueFor = (draft: SetupDraft): Promise<SetupCatalogue> => sharedCatalogueFor(database.db, draft);

async function engineResultFor(draft: SetupDraft): Promise<BalanceResult> {
  return evaluateBalance(toBalanceInput(draft, await catalogueFor(draft)));
}

interface StoredRow {
  version: unknown;
  status: unknown;
  name: unknown;
  mount_position_x_m: unknown;
  result_json: unknown;
  worst_flag: unknown;
  updated_at: unknown;
  cautions_acknowledged: unknown;
  payloads: Array<Record<string, unknown>>;
}

async function storedRow(id: string): Promise<StoredRow | null> {
  const rows = await database.client.execute({
    sql: "select version, status, name, mount_position_x_m, r.result_json as result_json, worst_flag, updated_at, cautions_acknowledged from setups left join setup_results r on r.setup_id = setups.id where id = ?",
    args: [id],
  });
  const payloads = await database.client.execute({
    sql: "select name, mass_kg, sort_order from setup_payloads where setup_id = ? order by sort_order",
    args: [id],
  });
  const row = rows.rows[0];
  if (!row) return null;
  return {
    version: row.version,
    status: row.status,
    name: row.name,
    mount_position_x_m: row.mount_position_x_m,
    result_json: row.result_json,
    worst_flag: row.worst_flag,
    updated_at: row.updated_at,
    cautions_acknowledged: row.cautions_acknowledged,
    payloads: payloads.rows.map((r) => ({ name: r.name, mass_kg: r.mass_kg, sort_order: r.sort_order })),
  };
}

async function countSetups(): Promise<number> {
  const result = await database.client.execute("select count(*) as n from setups");
  return Number(result.rows[0].n);
}

async function readSetup(client: ApiClient, id: string): Promise<StoredSetupBody> {
  const response = await client.get(`/api/setups/${id}`);
  expect(response.status, `GET ${id}`).toBe(200);
  return (await response.json()) as StoredSetupBody;
}

async function createSetup(client: ApiClient, draft: SetupDraft): Promise<{ id: string; version: number; result: BalanceResult }> {
  const response = await client.request("POST", "/api/setups", { draft });
  expect(response.status, JSON.stringify(await response.clone().json())).toBe(201);
  return (await response.json()) as { id: string; version: number; result: BalanceResult };
}

/** A private copy of a seeded setup, so a test's writes never meet another test's. */
async function freshCopyOf(seedId: string, name: string): Promise<StoredSetupBody> {
  const seed = await readSetup(customer, seedId);
  const created = await createSetup(customer, { ...seed.draft, name });
  return readSetup(customer, created.id);
}

/** A new position on the rail, different from the present one. */
async function anotherRailPosition(draft: SetupDraft): Promise<number> {
  const { model } = await catalogueFor(draft);
  // Aft first: forward of the tether point the demo whip meets the line to the anchor (a stop).
  const candidates = [0.7, 0.3, 0.5].map((f) => Number((model.railStartXM + f * (model.railEndXM - model.railStartXM)).toFixed(4)));
  const position = candidates.find((x) => Math.abs(x - draft.mountPositionXM) > 0.01);
  expect(position).toBeDefined();
  return position as number;
}

describe("saving a setup: the server computes and stores its own balance", () => {
  it("returns the stored result equal to the engine's evaluation of the stored input when a customer moves the mount", async () => {
    const before = await freshCopyOf("set-wren-whip", "Whip, moved mount");
    const draft: SetupDraft = { ...before.draft, mountPositionXM: await anotherRailPosition(before.draft) };

    const put = await customer.request("PUT", `/api/setups/${before.id}`, { version: before.version, draft });
    expect(put.status).toBe(200);
    const saved = (await put.json()) as { version: number; status: string; result: BalanceResult; worstFlag: FlagLevel };
    expect(saved.version).toBe(before.version + 1);

    const after = await readSetup(customer, before.id);
    expect(after.version).toBe(saved.version);
    expect(after.draft.mountPositionXM).toBe(draft.mountPositionXM);

    const expected = await engineResultFor(after.draft);
    expect(after.result).toEqual(asJson(expected));
    expect(saved.result).toEqual(asJson(expected));
    expect(after.worstFlag).toBe(worstLevel(expected.flags));
    // moving the mount changed the balance, so the stored result is not the old one left in place
    expect(after.result).not.toEqual(before.result);

    // the same input through POST /api/balance gives the same answer
    const viaHttp = await customer.request("POST", "/api/balance", toBalanceInput(after.draft, await catalogueFor(after.draft)));
    expect(viaHttp.status).toBe(200);
    expect(await viaHttp.json()).toEqual(after.result);
  });

  it("returns the server's own numbers when a save carries a made-up result", async () => {
    const before = await freshCopyOf("set-wren-whip", "Whip, forged result");
    const draft = { ...before.draft, result: { grossLiftKg: 999 } } as SetupDraft;
    const put = await customer.request("PUT", `/api/setups/${before.id}`, {
      version: before.version,
      draft,
      result: { grossLiftKg: 999, freeLiftKg: 998, flags: [] },
      worstFlag: "ok",
    });
    expect(put.status).toBe(200);
    const after = await readSetup(customer, before.id);
    expect(after.version).toBe(before.version + 1);
    expect(after.result.grossLiftKg).not.toBe(999);
    expect(after.result).toEqual(asJson(await engineResultFor(after.draft)));
    const row = await storedRow(before.id);
    expect(JSON.parse(String(row?.result_json))).toEqual(after.result);
    expect(row?.worst_flag).toBe(worstLevel(after.result.flags));
  });

  it("returns 409 with a clear message and overwrites nothing when the version is stale", async () => {
    const source = await readSetup(customer, "set-wren-whip");
    const created = await createSetup(customer, { ...source.draft, name: "Stale version check" });
    expect(created.version).toBe(1);

    const firstDraft: SetupDraft = {
      ...source.draft,
      name: "Stale version check, first save",
      mountPositionXM: await anotherRailPosition(source.draft),
    };
    const first = await customer.request("PUT", `/api/setups/${created.id}`, { version: 1, draft: firstDraft });
    expect(first.status).toBe(200);
    expect(((await first.json()) as { version: number }).version).toBe(2);
    const rowAfterFirst = await storedRow(created.id);

    const secondDraft: SetupDraft = { ...firstDraft, name: "Stale version check, second save", gas: { ...firstDraft.gas, purity: 0.9 } };
    const stale = await customer.request("PUT", `/api/setups/${created.id}`, { version: 1, draft: secondDraft });
    expect(stale.status).toBe(409);
    const body = (await stale.json()) as ErrorBody;
    expect(body.error.code).toBe("conflict");
    expect(body.error.message).toMatch(/version 2/);
    expect(body.error.message).toMatch(/[Nn]othing was overwritten/);

    const now = await readSetup(customer, created.id);
    expect(now.version).toBe(2);
    expect(now.draft).toEqual(firstDraft);
    expect(await storedRow(created.id)).toEqual(rowAfterFirst);

    const staleSubmit = await customer.request("POST", `/api/setups/${created.id}/submit`, { version: 1, acknowledgeCautions: true });
    expect(staleSubmit.status).toBe(409);
    expect(await storedRow(created.id)).toEqual(rowAfterFirst);
  });
});

describe("submitting a setup for review", () => {
  it("returns 422 and leaves it a draft when the setup has a stop flag", async () => {
    const heavy = await readSetup(customer, "set-wren-heavy");
    expect(heavy.status).toBe("draft");
    const expected = await engineResultFor(heavy.draft);
    const stops = expected.flags.filter((f) => f.level === "stop");
    expect(stops.length).toBeGreaterThan(0);
    const rowBefore = await storedRow("set-wren-heavy");

    const submit = await customer.request("POST", "/api/setups/set-wren-heavy/submit", {
      version: heavy.version,
      acknowledgeCautions: true,
    });
    expect(submit.status).toBe(422);
    const body = (await submit.json()) as ErrorBody;
    expect(body.error.code).toBe("unprocessable");
    expect((body.error.issues ?? []).map((i) => i.path)).toEqual(expect.arrayContaining(stops.map((f) => `flags.${f.code}`)));

    const rowAfter = await storedRow("set-wren-heavy");
    expect(rowAfter?.status).toBe("draft");
    expect(rowAfter).toEqual(rowBefore);
  });

  it("returns 200 and 'submitted' without any acknowledgement when every flag is ok", async () => {
    // Find, with the engine itself, a rail position and fill at which the copied camera setup is all ok.
    const cam = await readSetup(customer, "set-wren-cam");
    const catalogue = await catalogueFor(cam.draft);
    const { railStartXM, railEndXM } = catalogue.model;
    let okDraft: SetupDraft | null = null;
    for (let step = 0; step <= 40 && !okDraft; step += 1) {
      const candidate: SetupDraft = {
        ...cam.draft,
        name: "Orchard camera, all ok",
        mountPositionXM: railStartXM + (step / 40) * (railEndXM - railStartXM),
      };
      if (worstLevel(evaluateBalance(toBalanceInput(candidate, catalogue)).flags) === "ok") okDraft = candidate;
    }
    expect(okDraft, "no rail position gives an all-ok camera setup").not.toBeNull();

    const created = await createSetup(customer, okDraft as SetupDraft);
    const stored = await readSetup(customer, created.id);
    expect(stored.status).toBe("draft");
    expect(stored.worstFlag).toBe("ok");

    const plain = await customer.request("POST", `/api/setups/${created.id}/submit`, {
      version: stored.version,
      acknowledgeCautions: false,
    });
    expect(plain.status).toBe(200);
    expect(((await plain.json()) as { status: string }).status).toBe("submitted");
    const row = await storedRow(created.id);
    expect(row?.status).toBe("submitted");
    expect(row?.version).toBe(stored.version + 1);
    expect(Number(row?.cautions_acknowledged)).toBe(0);
  });

  it("returns 422 without acknowledgement and 200 with it when the worst flag is a caution", async () => {
    // Find, with the engine itself, a fill at which the copied setup flies but only with a caution.
    const cam = await readSetup(customer, "set-wren-cam");
    const catalogue = await catalogueFor(cam.draft);
    let cautionDraft: SetupDraft | null = null;
    for (let fill = 1; fill >= 0.05 && !cautionDraft; fill = Number((fill - 0.01).toFixed(2))) {
      const candidate: SetupDraft = { ...cam.draft, name: "Orchard camera, thin fill", gas: { ...cam.draft.gas, fillFraction: fill } };
      if (worstLevel(evaluateBalance(toBalanceInput(candidate, catalogue)).flags) === "caution") cautionDraft = candidate;
    }
    expect(cautionDraft, "no fill gives a caution-only setup").not.toBeNull();
    const draft = cautionDraft as SetupDraft;

    const created = await createSetup(customer, draft);
    const stored = await readSetup(customer, created.id);
    expect(stored.worstFlag).toBe("caution");

    const plain = await customer.request("POST", `/api/setups/${created.id}/submit`, { version: stored.version });
    expect(plain.status).toBe(422);
    expect(((await plain.json()) as ErrorBody).error.message).toMatch(/[Aa]cknowledge/);
    const rowBetween = await storedRow(created.id);
    expect(rowBetween?.status).toBe("draft");
    expect(rowBetween?.version).toBe(stored.version);

    const acknowledged = await customer.request("POST", `/api/setups/${created.id}/submit`, {
      version: stored.version,
      acknowledgeCautions: true,
    });
    expect(acknowledged.status).toBe(200);
    const row = await storedRow(created.id);
    expect(row?.status).toBe("submitted");
    expect(Number(row?.cautions_acknowledged)).toBe(1);

    const again = await customer.request("POST", `/api/setups/${created.id}/submit`, {
      version: stored.version + 1,
      acknowledgeCautions: true,
    });
    expect(again.status).toBe(409);
  });
});

describe("only the owner reaches a setup", () => {
  it("returns 404 to another customer and to support, and 401 to a stranger, and changes nothing when they try", async () => {
    const own = await readSetup(customer, "set-wren-whip");
    const rowBefore = await storedRow("set-wren-whip");
    // A draft that is valid for anyone (no serial unit), so the answer is about ownership, not the draft.
    const otherDraft: SetupDraft = { ...own.draft, name: "Taken over", unitId: null };

    const tobin = new ApiClient(baseURL);
    expect((await tobin.signIn("tobin@trimrail.test")).status).toBe(200);
    expect((await tobin.get("/api/setups/set-wren-whip")).status).toBe(404);
    expect((await tobin.request("PUT", "/api/setups/set-wren-whip", { version: own.version, draft: otherDraft })).status).toBe(404);
    expect(
      (await tobin.request("POST", "/api/setups/set-wren-whip/submit", { version: own.version, acknowledgeCautions: true })).status,
    ).toBe(404);
    expect((await tobin.request("DELETE", "/api/setups/set-wren-whip")).status).toBe(404);
    expect((await tobin.request("POST", "/api/setups/set-wren-whip/duplicate")).status).toBe(404);
    const tobinList = (await (await tobin.get("/api/setups")).json()) as { setups: Array<{ id: string }> };
    expect(tobinList.setups.map((s) => s.id)).not.toContain("set-wren-whip");

    const support = new ApiClient(baseURL);
    expect((await support.signIn("support@trimrail.test")).status).toBe(200);
    expect((await support.request("PUT", "/api/setups/set-wren-whip", { version: own.version, draft: otherDraft })).status).toBe(404);

    const stranger = new ApiClient(baseURL);
    const strangerCalls: Array<[string, string, unknown]> = [
      ["GET", "/api/setups/set-wren-whip", undefined],
      ["PUT", "/api/setups/set-wren-whip", { version: own.version, draft: otherDraft }],
      ["DELETE", "/api/setups/set-wren-whip", undefined],
      ["POST", "/api/setups/set-wren-whip/submit", { version: own.version }],
      ["POST", "/api/setups", { draft: otherDraft }],
    ];
    for (const [method, path, body] of strangerCalls) {
      const response = await stranger.request(method, path, body);
      expect(response.status, `${method} ${path}`).toBe(401);
    }

    expect(await storedRow("set-wren-whip")).toEqual(rowBefore);
    expect(await readSetup(customer, "set-wren-whip")).toEqual(own);
  });
});

describe("bad drafts are refused before anything is written", () => {
  it("returns 400 with the field at fault and writes no row when a draft names unknown or foreign things", async () => {
    const source = await readSetup(customer, "set-wren-whip");
    const rowBefore = await storedRow("set-wren-whip");
    const countBefore = await countSetups();

    const cases: Array<[string, SetupDraft, string]> = [
      ["unknown model", { ...source.draft, modelId: "mdl-no-such-envelope" }, "draft.modelId"],
      ["unknown mount", { ...source.draft, mountId: "mnt-no-such-mount" }, "draft.mountId"],
      [
        "negative payload mass",
        { ...source.draft, payloads: source.draft.payloads.map((p, i) => (i === 0 ? { ...p, massKg: -0.2 } : p)) },
        "draft.payloads[0].massKg",
      ],
      ["someone else's unit", { ...source.draft, unitId: "unit-r11-0023" }, "draft.unitId"],
      ["purity above 1", { ...source.draft, gas: { ...source.draft.gas, purity: 1.5 } }, "draft.gas.purity"],
      [
        "unknown payload template",
        { ...source.draft, payloads: source.draft.payloads.map((p, i) => (i === 0 ? { ...p, templateId: "tpl-no-such-template" } : p)) },
        "draft.payloads[0].templateId",
      ],
      [
        "unknown adapter",
        { ...source.draft, payloads: source.draft.payloads.map((p, i) => (i === 0 ? { ...p, adapterId: "adp-no-such-adapter" } : p)) },
        "draft.payloads[0].adapterId",
      ],
    ];
    for (const [label, draft, wantedPath] of cases) {
      for (const [method, path, body] of [
        ["POST", "/api/setups", { draft }],
        ["PUT", "/api/setups/set-wren-whip", { version: source.version, draft }],
      ] as const) {
        const response = await customer.request(method, path, body);
        expect(response.status, `${label}, ${method}`).toBe(400);
        const error = ((await response.json()) as ErrorBody).error;
        expect(error.code).toBe("bad_request");
        expect(
          (error.issues ?? []).map((i) => i.path),
          `${label}, ${method}`,
        ).toContain(wantedPath);
      }
    }
    const noDraft = await customer.request("POST", "/api/setups", { name: "no draft" });
    expect(noDraft.status).toBe(400);
    expect((((await noDraft.json()) as ErrorBody).error.issues ?? []).map((i) => i.path)).toContain("draft");
    expect((await customer.request("POST", "/api/setups", "{draft:")).status).toBe(400);

    expect(await countSetups()).toBe(countBefore);
    expect(await storedRow("set-wren-whip")).toEqual(rowBefore);
  });
});

describe("starting a setup from a model, and duplicating one", () => {
  it("returns 201 with a neutral draft on that model, and 400 with the path for an unknown model", async () => {
    const created = await customer.request("POST", "/api/setups", { modelId: "mdl-ridge-06" });
    expect(created.status).toBe(201);
    const { id } = (await created.json()) as { id: string };
    const stored = await readSetup(customer, id);
    expect(stored.draft.modelId).toBe("mdl-ridge-06");
    expect(stored.draft.payloads).toEqual([]);
    expect(stored.result).toEqual(asJson(await engineResultFor(stored.draft)));

    const countBefore = await countSetups();
    const unknown = await customer.request("POST", "/api/setups", { modelId: "mdl-no-such-envelope" });
    expect(unknown.status).toBe(400);
    expect((((await unknown.json()) as ErrorBody).error.issues ?? []).map((i) => i.path)).toContain("modelId");
    const both = await customer.request("POST", "/api/setups", { modelId: "mdl-ridge-06", draft: stored.draft });
    expect(both.status).toBe(400);
    expect(await countSetups()).toBe(countBefore);
  });

  it("returns 201 and a 'Copy of' draft equal to the source when the owner duplicates it", async () => {
    const source = await readSetup(customer, "set-wren-cam");
    const response = await customer.request("POST", "/api/setups/set-wren-cam/duplicate");
    expect(response.status).toBe(201);
    const copy = await readSetup(customer, ((await response.json()) as { id: string }).id);
    expect(copy.draft).toEqual({ ...source.draft, name: `Copy of ${source.draft.name}` });
    expect(copy.status).toBe("draft");
    expect(copy.version).toBe(1);
  });
});

describe("deleting a setup", () => {
  it("returns 204 and then 404 when the owner deletes their setup", async () => {
    const source = await readSetup(customer, "set-wren-whip");
    const created = await createSetup(customer, { ...source.draft, name: "To be deleted" });
    expect((await customer.get(`/api/setups/${created.id}`)).status).toBe(200);
    const countBefore = await countSetups();

    const deleted = await customer.request("DELETE", `/api/setups/${created.id}`);
    expect(deleted.status).toBe(204);
    expect((await customer.get(`/api/setups/${created.id}`)).status).toBe(404);
    expect((await customer.request("DELETE", `/api/setups/${created.id}`)).status).toBe(404);
    expect(await storedRow(created.id)).toBeNull();
    expect(await countSetups()).toBe(countBefore - 1);
    const list = (await (await customer.get("/api/setups")).json()) as { setups: Array<{ id: string }> };
    expect(list.setups.map((s) => s.id)).not.toContain(created.id);
  });
});

describe("PUT /api/me/preferences", () => {
  it("returns 200 and the session shows imperial when a person picks imperial, and 400 for an unknown system", async () => {
    const email = `units-${Date.now()}-${Math.floor(Math.random() * 1e6)}@trimrail.test`;
    const person = await signUpAndVerify({
      baseURL,
      mailDir: inject("mailDir"),
      name: "Ada Unitwell",
      email,
      password: "copper-kettle-orbit",
    });
    const initial = (await (await person.get("/api/auth/get-session")).json()) as { user: { unitSystem: string } };
    expect(initial.user.unitSystem).toBe("metric");

    const imperial = await person.request("PUT", "/api/me/preferences", { unitSystem: "imperial" });
    expect(imperial.status).toBe(200);
    expect(await imperial.json()).toEqual({ unitSystem: "imperial" });
    const session = (await (await person.get("/api/auth/get-session")).json()) as { user: { unitSystem: string } };
    expect(session.user.unitSystem).toBe("imperial");

    const furlongs = await person.request("PUT", "/api/me/preferences", { unitSystem: "furlongs" });
    expect(furlongs.status).toBe(400);
    expect((((await furlongs.json()) as ErrorBody).error.issues ?? []).map((i) => i.path)).toContain("unitSystem");
    const still = (await (await person.get("/api/auth/get-session")).json()) as { user: { unitSystem: string } };
    expect(still.user.unitSystem).toBe("imperial");

    expect((await new ApiClient(baseURL).request("PUT", "/api/me/preferences", { unitSystem: "metric" })).status).toBe(401);
  });
});
