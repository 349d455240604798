import { readFileSync } from "node:fs";
import { beforeAll, describe, expect, inject, it } from "vitest";
import {
  balanceInputSchema,
  evaluateBalance,
  operatingEnvelope,
  type BalanceInput,
  type BalanceResult,
  type OperatingEnvelope,
} from "@/lib/balance";
import { ApiClient } from "../support/http";

const baseURL = inject("baseURL");
const FIXTURE_PATH = "tests/fixtures/demo-setup.json";
const fixtureText = readFileSync(FIXTURE_PATH, "utf8");
const fixture = (): BalanceInput => JSON.parse(fixtureText) as BalanceInput;

/** What travels over the wire: the engine's result as JSON would carry it. */
const asJson = (value: unknown): unknown => JSON.parse(JSON.stringify(value));

interface ErrorBody {
  error: { code: string; message: string; issues?: Array<{ path: string; message: string }> };
}

/** Every number anywhere inside `value`, with the path it sits at. */
function numbersIn(value: unknown, at = "$"): Array<[string, number]> {
  if (typeof value === "number") return [[at, value]];
  if (Array.isArray(value)) return value.flatMap((v, i) => numbersIn(v, `${at}[${i}]`));
  if (value && typeof value === "object") return Object.entries(value).flatMap(([k, v]) => numbersIn(v, `${at}.${k}`));
  return [];
}

let customer: ApiClient;

beforeAll(async () => {
  customer = new ApiClient(baseURL);
  expect((await customer.signIn("customer@trimrail.test")).status).toBe(200);
});

// The CLI's own agreement with the engine is tested in the unit project (tests/unit/balance/cli.test.ts).
describe("POST /api/balance", () => {
  it("returns the engine's result when given the demo fixture", async () => {
    const response = await customer.request("POST", "/api/balance", fixtureText);
    expect(response.status).toBe(200);
    const overHttp = (await response.json()) as BalanceResult;

    expect(overHttp).toEqual(asJson(evaluateBalance(fixture())));
    // the fixture is a real flying setup, so the comparison is not between two empty answers
    expect(overHttp.grossLiftKg).toBeGreaterThan(0);
    expect(overHttp.flags.length).toBeGreaterThan(0);
  });

  it("returns every field of the result contract when given the demo fixture", async () => {
    const response = await customer.request("POST", "/api/balance", fixtureText);
    expect(response.status).toBe(200);
    const body = (await response.json()) as Record<string, unknown>;
    for (const key of ["airDensityKgM3", "gasDensityKgM3", "grossLiftKg", "totalMassKg", "freeLiftKg", "freeLiftRatio"]) {
      expect(typeof body[key], key).toBe("number");
      expect(Number.isFinite(body[key]), key).toBe(true);
    }
    const centre = body.centreOfMass as { x: unknown; z: unknown };
    expect(typeof centre.x).toBe("number");
    expect(typeof centre.z).toBe("number");
    for (const key of ["calmTrimDeg", "wind", "gust", "maxTetherOutM"]) expect(body, key).toHaveProperty(key);
    expect(body.calmTrimDeg === null || typeof body.calmTrimDeg === "number").toBe(true);
    // the fixture has wind, gust and a tether, so these are filled in
    expect(body.wind).toBeTypeOf("object");
    expect(body.wind).not.toBeNull();
    expect(body.gust).toBeTypeOf("object");
    expect(body.gust).not.toBeNull();
    expect(typeof (body.helium as { fillVolumeM3: unknown }).fillVolumeM3).toBe("number");
    const f = fixture();
    expect((body.helium as { fillVolumeM3: number }).fillVolumeM3).toBeCloseTo(f.envelope.gasVolumeM3 * (f.gas?.fillFraction ?? 1), 9);
    const flags = body.flags as Array<Record<string, unknown>>;
    expect(Array.isArray(flags)).toBe(true);
    expect(flags.length).toBeGreaterThan(0);
    for (const flag of flags) {
      expect(typeof flag.code).toBe("string");
      expect(["ok", "caution", "stop"]).toContain(flag.level);
      expect(typeof flag.message).toBe("string");
      expect((flag.message as string).length).toBeGreaterThan(0);
      // flags are data: the figures they speak of (SI, each with its quantity) and named parameters
      expect(flag.figures).toBeTypeOf("object");
      expect(flag.params).toBeTypeOf("object");
      for (const f of Object.values(flag.figures as Record<string, Record<string, unknown>>)) {
        expect(typeof f.quantity).toBe("string");
        expect(typeof f.unit).toBe("string");
        expect(Number.isFinite(f.value)).toBe(true);
      }
    }
  });
});

describe("POST /api/balance refuses bad input", () => {
  async function expectBadRequest(body: string, wantedPath?: string): Promise<ErrorBody> {
    const response = await customer.request("POST", "/api/balance", body, { "content-type": "application/json" });
    expect(response.status, body.slice(0, 80)).toBe(400);
    const parsed = (await response.json()) as ErrorBody;
    expect(parsed.error.code).toBe("bad_request");
    expect(parsed.error.message.length).toBeGreaterThan(0);
    if (wantedPath !== undefined) {
      const paths = (parsed.error.issues ?? []).map((i) => i.path);
      expect(paths, body.slice(0, 80)).toContain(wantedPath);
    }
    return parsed;
  }

  it("returns 400 with the field at fault, 413 for a huge body and 401 for a stranger when the body is bad", async () => {
    await expectBadRequest('{"envelope":{"gasVolumeM3":NaN}}');

    const stringVolume = fixture() as unknown as { envelope: Record<string, unknown> };
    stringVolume.envelope.gasVolumeM3 = "1.1";
    await expectBadRequest(JSON.stringify(stringVolume), "envelope.gasVolumeM3");

    const negativePayload = fixture();
    negativePayload.payloads[0].massKg = -0.12;
    await expectBadRequest(JSON.stringify(negativePayload), "payloads[0].massKg");

    const negativeEnvelope = fixture();
    negativeEnvelope.envelope.massKg = -0.5;
    await expectBadRequest(JSON.stringify(negativeEnvelope), "envelope.massKg");

    const impure = fixture();
    impure.gas = { ...impure.gas, purity: 1.5 };
    await expectBadRequest(JSON.stringify(impure), "gas.purity");

    const noEnvelope = fixture() as Partial<BalanceInput>;
    delete noEnvelope.envelope;
    await expectBadRequest(JSON.stringify(noEnvelope), "envelope");

    await expectBadRequest("");
    await expectBadRequest("   ");
    await expectBadRequest("[1,2,3]");
    await expectBadRequest(JSON.stringify([fixture()]));

    const huge = JSON.stringify({ ...fixture(), padding: "x".repeat(5 * 1024 * 1024) });
    const tooLarge = await customer.request("POST", "/api/balance", huge);
    expect(tooLarge.status).toBe(413);
    expect(((await tooLarge.json()) as ErrorBody).error.code).toBe("payload_too_large");

    const anonymous = new ApiClient(baseURL);
    const stranger = await anonymous.request("POST", "/api/balance", fixtureText);
    expect(stranger.status).toBe(401);
    expect(((await stranger.json()) as ErrorBody).error.code).toBe("unauthenticated");

    const after = await customer.request("POST", "/api/balance", fixtureText);
    expect(after.status).toBe(200);
    expect(await after.json()).toEqual(asJson(evaluateBalance(fixture())));
  });

  it("returns 200 with a mount-off-rail stop flag, not a 400, when the mount is off the rail", async () => {
    const offRail = fixture();
    offRail.mount.positionX = offRail.envelope.rail.endX + 0.3;
    const response = await customer.request("POST", "/api/balance", offRail);
    expect(response.status).toBe(200);
    const body = (await response.json()) as BalanceResult;
    expect(body.flags.find((f) => f.code === "mount-off-rail")?.level).toBe("stop");
    expect(body).toEqual(asJson(evaluateBalance(offRail)));

    // and on the rail the same flag is not a stop, so the check above is about the position
    const onRail = await customer.request("POST", "/api/balance", fixtureText);
    const onRailBody = (await onRail.json()) as BalanceResult;
    expect(onRailBody.flags.find((f) => f.code === "mount-off-rail")?.level).toBe("ok");
  });
});

describe("POST /api/balance/envelope", () => {
  it("returns the engine's operating envelope of the setup when given { setup, options }", async () => {
    const options = { targetHeightM: 30, windCount: 6, lineCount: 5 };
    const response = await customer.request("POST", "/api/balance/envelope", { setup: fixture(), options });
    expect(response.status).toBe(200);
    const body = (await response.json()) as OperatingEnvelope;
    expect(body).toEqual(asJson(operatingEnvelope(fixture(), options)));
    expect(body.reason).toBeNull();
    expect(body.points).toHaveLength(6);
    expect(body.points[0]).toHaveLength(5);
    expect(body.target?.lineOutM).toBeGreaterThan(30);
    for (const column of body.points) {
      for (const point of column) expect(["ok", "caution", "stop"]).toContain(point.worstLevel);
    }
    // Without options: the full 16 × 20 grid.
    const full = await customer.request("POST", "/api/balance/envelope", { setup: fixture() });
    expect(full.status).toBe(200);
    const grid = (await full.json()) as OperatingEnvelope;
    expect(grid.windsMS).toHaveLength(16);
    expect(grid.linesOutM).toHaveLength(20);
  });

  it("returns 400 with the paths at fault, and 401 for a stranger, when the body is bad", async () => {
    const post = (body: unknown) => customer.request("POST", "/api/balance/envelope", body);
    const negative = fixture();
    negative.payloads[0].massKg = -1;
    const bad = await post({ setup: negative, options: { windCount: 1, targetHeightM: -5 } });
    expect(bad.status).toBe(400);
    const error = ((await bad.json()) as ErrorBody).error;
    expect(error.code).toBe("bad_request");
    const paths = (error.issues ?? []).map((i) => i.path);
    expect(paths).toContain("setup.payloads[0].massKg");
    expect(paths).toContain("options.windCount");
    expect(paths).toContain("options.targetHeightM");

    const bare = await post(fixture()); // a setup without the { setup } wrapper
    expect(bare.status).toBe(400);
    expect(((await bare.json()) as ErrorBody).error.issues?.map((i) => i.path)).toContain("setup");
    expect((await post("[]")).status).toBe(400);

    const stranger = await new ApiClient(baseURL).request("POST", "/api/balance/envelope", { setup: fixture() });
    expect(stranger.status).toBe(401);
  });
});

// ---- fuzz ----

/** Small deterministic generator (mulberry32), so a failure can be replayed. */
function random(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

/** Every path to a key or an array element inside `value`. */
function pathsIn(value: Json, at: Array<string | number> = []): Array<Array<string | number>> {
  if (Array.isArray(value)) return value.flatMap((v, i) => [[...at, i], ...pathsIn(v, [...at, i])]);
  if (value && typeof value === "object") return Object.entries(value).flatMap(([k, v]) => [[...at, k], ...pathsIn(v, [...at, k])]);
  return [];
}

const REPLACEMENTS: ReadonlyArray<() => Json> = [
  () => -1,
  () => 1e308,
  () => -1e308,
  () => 0,
  () => "12",
  () => null,
  () => ({ nested: { value: 1 } }),
  () => [],
  () => true,
];

function mutate(base: Json, next: () => number): { body: Json; description: string } {
  const body = JSON.parse(JSON.stringify(base)) as Json;
  const count = 1 + Math.floor(next() * 3);
  const steps: string[] = [];
  for (let m = 0; m < count; m++) {
    const paths = pathsIn(body);
    if (paths.length === 0) break;
    const target = paths[Math.floor(next() * paths.length)];
    let parent = body as Record<string | number, Json>;
    for (const part of target.slice(0, -1)) parent = parent[part] as Record<string | number, Json>;
    const key = target[target.length - 1];
    if (next() < 0.2) {
      if (Array.isArray(parent)) parent.splice(key as number, 1);
      else delete parent[key];
      steps.push(`drop ${target.join(".")}`);
    } else {
      const replacement = REPLACEMENTS[Math.floor(next() * REPLACEMENTS.length)]();
      parent[key] = replacement;
      steps.push(`${target.join(".")} = ${JSON.stringify(replacement)}`);
    }
  }
  return { body, description: steps.join("; ") };
}

describe("POST /api/balance under random mutations of the fixture", () => {
  it("returns 200 with finite numbers equal to the engine's, or 400, and never 5xx, when given 200 mutated bodies", async () => {
    const next = random(0x7e11);
    const cases = Array.from({ length: 200 }, () => mutate(fixture() as unknown as Json, next));
    const statuses = new Map<number, number>();
    for (let start = 0; start < cases.length; start += 10) {
      const batch = cases.slice(start, start + 10);
      const answers = await Promise.all(batch.map(({ body }) => customer.request("POST", "/api/balance", body)));
      for (let i = 0; i < batch.length; i++) {
        const { body, description } = batch[i];
        const response = answers[i];
        statuses.set(response.status, (statuses.get(response.status) ?? 0) + 1);
        expect([200, 400, 413], description).toContain(response.status);
        const answer = (await response.json()) as unknown;
        const parsed = balanceInputSchema.safeParse(body);
        if (response.status === 200) {
          expect(parsed.success, description).toBe(true);
          if (!parsed.success) continue;
          const local = evaluateBalance(parsed.data);
          // in the engine's own output (before JSON could turn NaN into null) every number is finite
          for (const [at, n] of numbersIn(local)) expect(Number.isFinite(n), `${description}: ${at} = ${n}`).toBe(true);
          for (const [at, n] of numbersIn(answer)) expect(Number.isFinite(n), `${description}: ${at}`).toBe(true);
          expect(answer, description).toEqual(asJson(local));
        } else if (response.status === 400) {
          expect(parsed.success, description).toBe(false);
          expect((answer as ErrorBody).error.code, description).toBe("bad_request");
        }
      }
    }
    // the mutations reach both sides of the schema
    expect(statuses.get(200) ?? 0).toBeGreaterThan(0);
    expect(statuses.get(400) ?? 0).toBeGreaterThan(0);
  });
});
