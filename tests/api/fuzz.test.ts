import { createHash, randomUUID } from "node:crypto";
import type { z } from "zod";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/db/index";
import { balanceInputSchema, operatingEnvelopeRequestSchema } from "@/lib/balance";
import { PASSWORD_MIN_LENGTH } from "@/lib/auth/password-rule";
import { toBalanceInput } from "@/lib/setups/balance-input";
import type { SetupDraft } from "@/lib/setups/setup-draft";
import * as catalogueSchemas from "@/app/api/catalogue/schema";
import * as setupSchemas from "@/app/api/setups/schema";
import { preferencesSchema } from "@/app/api/me/preferences/schema";
import { roleChangeSchema } from "@/app/api/users/[id]/role/schema";
import { storageConfig } from "@/lib/storage/config";
import { createS3Client } from "@/lib/storage/s3-client";
import { listObjectKeys } from "../support/attachments-api";
import { changedTables, COLUMNS_LEFT_OUT, digestDatabase, TABLES_LEFT_OUT } from "../support/db-digest";
import { candidateBodies, parsedBody, UNPARSABLE, type FuzzBody } from "../support/fuzz-bodies";
import { multipartBodies } from "../support/fuzz-multipart";
import { runFuzz, type FuzzRequest, type FuzzTally } from "../support/fuzz-runner";
import { ApiClient, nextClientAddress } from "../support/http";
import { AUTH_ENDPOINTS, listMutatingRoutes, type MutatingRoute } from "../support/mutating-routes";
import { catalogueFor } from "../support/setup-fixtures";

// Every state-changing route gets at least 1,000 bad bodies, from the roles that may call it, with
// same-origin headers, and at junk addresses too. No answer may be a 5xx, and the database must be
// as it was: the bodies are refused by construction (each is checked against the route's own rules
// first), and a body the rules would take is only sent where the server must refuse it anyway
// (another owner's setup, a stale version, an id that does not exist) or to a pure calculation.

const baseURL = inject("baseURL");
const BODIES_PER_ROUTE = Number(process.env.FUZZ_TMP_BODIES ?? 1_000);
const CONCURRENCY = 8;
/** Fixed, so a failure can be replayed; TRIMRAIL_FUZZ_SEED tries other bodies. */
const SEED = Number(process.env.TRIMRAIL_FUZZ_SEED ?? 20_261_202);

type Who = "customer" | "support" | "maker" | "stranger" | "leaving";
type Params = Record<string, string>;

interface Target {
  /** A body the route takes; undefined when it reads none (then every address given must refuse). */
  sample?: unknown;
  /** Whether the route's own rules would take this body (for an app route, the body schema). */
  accepts?: (value: unknown) => boolean;
  /** Where the `i`th body goes, from whom and whether it would be taken; null: not sent. */
  params: (who: Who, accepted: boolean, value: unknown, i: number) => Params | null;
  /** Who sends the bodies; unset: the roles the route lets in. */
  senders?: readonly Who[];
  /** A 2xx is a right answer (a calculation that writes nothing, or signing out). */
  may2xx?: boolean;
  /** The route reads a multipart upload: its bodies are framings too. */
  multipart?: boolean;
  /** better-auth counts requests per client address: each request claims one of its own. */
  newAddressEach?: boolean;
  /** A form route's refusal: a 303 back to a page that says what to fix (its Location matches this). */
  refusedTo?: RegExp;
  /** The app's JSON reader takes only a JSON content type; better-auth's may take others. */
  readsOnlyJson?: boolean;
}

/** Path segments no route should choke on: not UTF-8, very long, dot segments, unicode, controls. */
const JUNK_SEGMENTS = [
  "%FF",
  "%FF%FE",
  "%E0%A4%A",
  "x".repeat(3_000),
  "y".repeat(20_000),
  "..",
  "%2E%2E",
  "%2e%2e%2f%2e%2e%2fetc",
  "ünïcødé-🎈",
  "%00",
  "a%2Fb",
  "%20",
  "__proto__",
  "constructor",
  "'%3B drop table setups%3B --",
  "%3Cscript%3E",
];

let database: ReturnType<typeof openDatabase>;
const clients = {} as Record<Who, ApiClient>;
const tallies: { route: string; tally: FuzzTally }[] = [];

/** Ids the targets aim at, read from the database as the earlier tests left it. */
const ids = {
  ownDraft: { id: "", version: 0 },
  othersDraft: "",
  submitted: { id: "", version: 0 },
  attachmentOfOthers: null as string | null,
  existing: {} as Record<string, string>,
  inUse: {} as Record<string, string>,
  unitWithTest: { unitId: "", testId: "" },
  otherUnit: "",
};
const samples = {} as Record<string, unknown>;

const row = async (sql: string, args: (string | number)[] = []) => (await database.client.execute({ sql, args })).rows[0];

beforeAll(async () => {
  database = openDatabase(inject("databaseUrl"));
  const emails: Partial<Record<Who, string>> = {
    customer: "customer@trimrail.test",
    support: "support@trimrail.test",
    maker: "maker@trimrail.test",
    leaving: "orrin@trimrail.test",
  };
  for (const who of ["customer", "support", "maker", "stranger", "leaving"] as const) {
    clients[who] = new ApiClient(baseURL);
    if (emails[who]) expect((await clients[who].signIn(emails[who])).status, who).toBe(200);
  }

  const own = await row("select id, version from setups where owner_id = 'usr-customer-1' and status = 'draft' order by id limit 1");
  ids.ownDraft = { id: String(own.id), version: Number(own.version) };
  ids.othersDraft = String(
    (await row("select id from setups where owner_id <> 'usr-customer-1' and submitted_at is null order by id limit 1")).id,
  );
  const submitted = await row("select id, version from setups where status = 'submitted' order by id limit 1");
  ids.submitted = { id: String(submitted.id), version: Number(submitted.version) };
  const attachment = await row(
    "select a.id from attachments a join setups s on s.id = a.setup_id where s.owner_id <> 'usr-customer-1' limit 1",
  );
  ids.attachmentOfOthers = attachment ? String(attachment.id) : null;
  for (const [kind, table] of Object.entries(CATALOGUE_TABLES)) {
    ids.existing[kind] = String((await row(`select id from ${table} order by id limit 1`)).id);
  }
  ids.inUse.models = String((await row("select model_id as id from setups limit 1")).id);
  ids.inUse.mounts = String((await row("select mount_id as id from setups limit 1")).id);
  ids.inUse.units = String((await row("select unit_id as id from setups where unit_id is not null limit 1")).id);
  const used = await row(
    "select adapter_id as a, template_id as t from setup_payloads where adapter_id is not null and template_id is not null limit 1",
  );
  ids.inUse.adapters = String(used.a);
  ids.inUse.templates = String(used.t);
  const test = await row("select id, unit_id from unit_lift_tests order by id limit 1");
  ids.unitWithTest = { unitId: String(test.unit_id), testId: String(test.id) };
  ids.otherUnit = String((await row("select id from envelope_units where id <> ? order by id limit 1", [ids.unitWithTest.unitId])).id);

  // Valid bodies, as the app itself reads and writes them.
  const { draft } = (await (await clients.customer.get(`/api/setups/${ids.ownDraft.id}`)).json()) as { draft: SetupDraft };
  samples.draft = draft;
  samples.balance = toBalanceInput(draft, await catalogueFor(database.db, draft));
  for (const kind of Object.keys(CATALOGUE_TABLES)) {
    const item = (await (await clients.maker.get(`/api/catalogue/${kind}/${ids.existing[kind]}`)).json()) as Record<string, unknown>;
    samples[kind] = valuesOf(kind, item);
  }
  samples.csv = await (await clients.maker.get("/api/catalogue/templates.csv")).text();
});
afterAll(() => {
  printReport();
  database?.client.close();
});

const CATALOGUE_TABLES = {
  models: "envelope_models",
  units: "envelope_units",
  mounts: "mounts",
  adapters: "adapters",
  templates: "payload_templates",
};
const VALUE_SCHEMAS: Record<string, z.ZodType> = {
  models: catalogueSchemas.envelopeModelValuesSchema,
  units: catalogueSchemas.envelopeUnitValuesSchema,
  mounts: catalogueSchemas.mountValuesSchema,
  adapters: catalogueSchemas.adapterValuesSchema,
  templates: catalogueSchemas.payloadTemplateValuesSchema,
};

/** The Workshop form's values of a catalogue item as its GET answers it (the JSON columns under their field names). */
function valuesOf(kind: string, item: Record<string, unknown>): unknown {
  const candidate = { ...item, hull: item.hullJson ?? item.hull, aero: item.aeroJson ?? item.aero, limits: item.limitsJson ?? item.limits };
  if (kind === "units") Object.assign(candidate, { ownerEmail: item.ownerEmail ?? "", notes: item.notes ?? "" });
  const parsed = VALUE_SCHEMAS[kind].safeParse(candidate);
  if (!parsed.success) throw new Error(`no valid ${kind} body from its GET: ${JSON.stringify(parsed.error.issues.slice(0, 3))}`);
  return parsed.data;
}

const schemaAccepts = (schema: z.ZodType) => (value: unknown) => schema.safeParse(value).success;
/** Picks the `i`th of a few addresses, so each gets its share of the bodies. */
const pick = <T>(i: number, options: T[]): T => options[i % options.length];
const MISSING = "fuzz-no-such-id";

/** Routes that read no body: every address must refuse, whoever asks. */
const refusingSetupAddress = (who: Who, i: number): Params =>
  who === "customer" ? { id: pick(i, [ids.othersDraft, ids.submitted.id, MISSING]) } : { id: pick(i, [ids.othersDraft, MISSING]) };

function catalogueTargets(kind: keyof typeof CATALOGUE_TABLES): Record<string, Target> {
  const values = VALUE_SCHEMAS[kind];
  const base = `/api/catalogue/${kind}`;
  return {
    [`POST ${base}`]: { sample: samples[kind], accepts: schemaAccepts(values), params: (_w, accepted) => (accepted ? null : {}) },
    [`PUT ${base}/[id]`]: {
      sample: samples[kind],
      accepts: schemaAccepts(values),
      params: (_w, accepted) => ({ id: accepted ? MISSING : ids.existing[kind] }),
    },
    [`DELETE ${base}/[id]`]: { params: (_w, _a, _v, i) => ({ id: pick(i, [MISSING, ids.inUse[kind]]) }) },
    [`PUT ${base}/[id]/active`]: {
      sample: { active: false },
      accepts: schemaAccepts(catalogueSchemas.activeBodySchema),
      params: (_w, accepted) => ({ id: accepted ? MISSING : ids.existing[kind] }),
    },
  };
}

function targets(): Record<string, Target> {
  const sampleDraft = samples.draft as SetupDraft;
  const version = (value: unknown) => (value as { version?: unknown }).version;
  const csvHeader = String(samples.csv).split(/\r?\n/)[0];
  const liftTest = {
    measuredGrossLiftKg: 1.1,
    temperatureC: 15,
    pressurePa: null,
    altitudeM: 40,
    purity: 0.98,
    testedOn: "2026-10-01",
    notes: "fuzz",
  };
  const authEmailTaken = (value: unknown) => {
    const body = value as Record<string, unknown> | null;
    return typeof body?.email === "string" && body.email.includes("@");
  };
  return {
    "POST /api/forms/new-setup": {
      sample: { name: "Fuzzed mast", modelId: "no-such-model" },
      // The generated bodies are JSON texts: read as a form (urlencoded or multipart) none carries both a
      // name and a model, so each is refused (415, 400 or a 303 back to the list with the problem).
      accepts: () => false,
      readsOnlyJson: false,
      params: () => ({}),
      senders: ["customer"],
      refusedTo: /^(https?:\/\/[^/]+)?\/setups\?problem=/,
    },
    "POST /api/setups": {
      sample: { draft: sampleDraft },
      accepts: schemaAccepts(setupSchemas.createSetupBodySchema),
      params: (_w, accepted) => (accepted ? null : {}),
    },
    "PUT /api/setups/[id]": {
      sample: { version: ids.ownDraft.version, draft: sampleDraft },
      accepts: schemaAccepts(setupSchemas.saveSetupBodySchema),
      // A draft the schema takes goes to the owner's setup only with a stale version (409 after the balance is worked out).
      params: (who, accepted, value, i) =>
        accepted
          ? { id: who === "customer" && version(value) !== ids.ownDraft.version ? ids.ownDraft.id : ids.othersDraft }
          : { id: pick(i, [ids.ownDraft.id, ids.ownDraft.id, ids.othersDraft]) },
    },
    "DELETE /api/setups/[id]": { params: (who, _a, _v, i) => refusingSetupAddress(who, i) },
    "POST /api/setups/[id]/submit": {
      sample: { version: ids.ownDraft.version, acknowledgeCautions: true },
      accepts: schemaAccepts(setupSchemas.submitSetupBodySchema),
      params: (who, accepted, value) =>
        accepted && !(who === "customer" && version(value) !== ids.ownDraft.version) ? { id: ids.othersDraft } : { id: ids.ownDraft.id },
    },
    "POST /api/setups/[id]/duplicate": { params: (who, _a, _v, i) => refusingSetupAddress(who, i) },
    "POST /api/setups/[id]/decision": {
      sample: {
        decision: "approved",
        reason: "The balance holds at every wind asked for.",
        reasonCodes: [],
        version: ids.submitted.version,
      },
      accepts: schemaAccepts(setupSchemas.decisionBodySchema),
      // Taken bodies reach the workflow with a stale version, or at a draft no one may decide on.
      params: (_w, accepted, value) => ({
        id: accepted && version(value) === ids.submitted.version ? ids.othersDraft : ids.submitted.id,
      }),
    },
    "PUT /api/setups/[id]/read": { params: (who, _a, _v, i) => ({ id: pick(i, [ids.othersDraft, MISSING]) }) },
    "POST /api/setups/[id]/attachments": {
      multipart: true,
      params: (who) => ({ id: who === "customer" ? ids.ownDraft.id : ids.submitted.id }),
    },
    "POST /api/setups/[id]/comments": {
      sample: { body: "Is the tether rated for the gusts?" },
      accepts: schemaAccepts(setupSchemas.commentBodySchema),
      params: (who, accepted) => ({ id: accepted ? ids.othersDraft : who === "customer" ? ids.ownDraft.id : ids.submitted.id }),
    },
    "PUT /api/users/[id]/role": {
      sample: { role: "support" },
      accepts: schemaAccepts(roleChangeSchema),
      // The maker's own account refuses any role but maker; an unknown account refuses all.
      params: (_w, accepted, value, i) =>
        accepted ? { id: (value as { role: string }).role !== "maker" && i % 2 === 0 ? "usr-maker-1" : MISSING } : { id: "usr-support-2" },
    },
    "PUT /api/me/preferences": {
      sample: { unitSystem: "imperial" },
      accepts: schemaAccepts(preferencesSchema),
      params: (_w, accepted) => (accepted ? null : {}),
    },
    "POST /api/balance": { sample: samples.balance, accepts: schemaAccepts(balanceInputSchema), params: () => ({}), may2xx: true },
    "POST /api/balance/envelope": {
      sample: { setup: samples.balance, options: { winds: 4, lines: 2 } },
      accepts: schemaAccepts(operatingEnvelopeRequestSchema),
      params: () => ({}),
      may2xx: true,
    },
    "DELETE /api/attachments/[id]": {
      params: (_w, _a, _v, i) => ({ id: pick(i, [MISSING, randomUUID(), ...(ids.attachmentOfOthers ? [ids.attachmentOfOthers] : [])]) }),
    },
    ...catalogueTargets("models"),
    ...catalogueTargets("units"),
    ...catalogueTargets("mounts"),
    ...catalogueTargets("adapters"),
    ...catalogueTargets("templates"),
    "POST /api/catalogue/units/[id]/lift-tests": {
      sample: liftTest,
      accepts: schemaAccepts(catalogueSchemas.liftTestValuesSchema),
      params: (_w, accepted) => ({ id: accepted ? MISSING : ids.unitWithTest.unitId }),
    },
    "DELETE /api/catalogue/units/[id]/lift-tests/[testId]": {
      params: (_w, _a, _v, i) =>
        pick(i, [
          { id: ids.unitWithTest.unitId, testId: MISSING },
          { id: MISSING, testId: ids.unitWithTest.testId },
          { id: ids.otherUnit, testId: ids.unitWithTest.testId },
        ]),
    },
    "POST /api/catalogue/templates/import": {
      sample: { csv: samples.csv },
      // A CSV with the export's header could hold rows that import; any other text must be refused.
      accepts: (value) =>
        catalogueSchemas.templatesImportBodySchema.safeParse(value).success && String((value as { csv: string }).csv).startsWith(csvHeader),
      params: (_w, accepted) => (accepted ? null : {}),
    },
    "POST /api/auth/sign-in/email": {
      // An address of no account and of no other test: wrong passwords lock the account they name for a
      // window, and the tests after this one sign in as the demo people.
      sample: { email: "fuzz-no-account@trimrail.test", password: "not-the-password-of-anyone" },
      accepts: () => false,
      params: () => ({}),
      senders: ["stranger"],
      newAddressEach: true,
      readsOnlyJson: false,
    },
    "POST /api/auth/sign-up/email": {
      sample: { name: "Fuzz Newcomer", email: "fuzz-newcomer@trimrail.test", password: "a-long-enough-password", callbackURL: "/setups" },
      // Anything with an address and a long enough password might make an account: never sent.
      accepts: (value) => {
        const body = value as Record<string, unknown> | null;
        return authEmailTaken(value) && typeof body?.password === "string" && body.password.length >= PASSWORD_MIN_LENGTH;
      },
      params: (_w, accepted) => (accepted ? null : {}),
      senders: ["stranger"],
      newAddressEach: true,
      readsOnlyJson: false,
    },
    "POST /api/auth/request-password-reset": {
      sample: { email: "customer@trimrail.test", redirectTo: "/reset-password" },
      // An address could queue a mail: never sent.
      accepts: authEmailTaken,
      params: (_w, accepted) => (accepted ? null : {}),
      senders: ["stranger"],
      newAddressEach: true,
      readsOnlyJson: false,
    },
    "POST /api/auth/reset-password": {
      sample: { newPassword: "another-long-password", token: "no-such-reset-token" },
      accepts: () => false,
      params: () => ({}),
      senders: ["stranger"],
      newAddressEach: true,
      readsOnlyJson: false,
    },
    // Signing out answers 200 whatever the body; the first request ends this client's session.
    "POST /api/auth/sign-out": { params: () => ({}), senders: ["leaving"], may2xx: true, readsOnlyJson: false },
  };
}

const ROLE_SENDERS: Record<string, Who> = { customer: "customer", support: "support", maker: "maker" };

function headersOf(who: Who, target: Target): Record<string, string> {
  const client = clients[who];
  const cookie = client.cookieHeader();
  return {
    origin: baseURL,
    "sec-fetch-site": "same-origin",
    "x-forwarded-for": target.newAddressEach ? nextClientAddress() : client.address,
    ...(cookie ? { cookie } : {}),
  };
}

/** Whether the route would take the body, as far as its rules can see it; a route that reads none takes anything. */
function isAccepted(target: Target, body: FuzzBody): boolean {
  if (!target.accepts) return true;
  const jsonType = body.contentType !== null && /json/i.test(body.contentType);
  if (target.readsOnlyJson !== false && !jsonType) return false;
  const value = parsedBody(body);
  return value !== UNPARSABLE && target.accepts(value);
}

const seedOf = (key: string) => SEED + createHash("sha256").update(key).digest().readUInt16BE(0);

/** At least BODIES_PER_ROUTE requests for one route: its bodies, each at its address, a share of them at junk addresses. */
function requestsFor(route: { method: string; template: string; roles: readonly string[] }, target: Target): FuzzRequest[] {
  const key = `${route.method} ${route.template}`;
  const senders = target.senders ?? route.roles.map((r) => ROLE_SENDERS[r]);
  const paramNames = [...route.template.matchAll(/\[(\w+)\]/g)].map((m) => m[1]);
  const requests: FuzzRequest[] = [];
  const seed = seedOf(key);
  for (let round = 0; requests.length < BODIES_PER_ROUTE && round < 10; round += 1) {
    const bodies = [
      ...(target.multipart ? multipartBodies({ seed: seed + round, count: BODIES_PER_ROUTE }) : []),
      ...candidateBodies(target.sample, { seed: seed + 100 * round, count: target.multipart ? 200 : BODIES_PER_ROUTE }),
    ];
    for (const body of bodies) {
      const i = requests.length;
      const who = senders[i % senders.length];
      const accepted = isAccepted(target, body);
      let params = target.params(who, accepted, parsedBody(body), i);
      if (params === null) continue;
      // One in eight goes to a junk address: the path must fail to parse (404) before the body is read.
      const junkAddress = paramNames.length > 0 && i % 8 === 7;
      if (junkAddress) params = { ...params, [paramNames[i % paramNames.length]]: pick(i >> 3, JUNK_SEGMENTS) };
      const path = route.template.replace(/\[(\w+)\]/g, (_, name: string) => params[name]);
      requests.push({
        method: route.method,
        path,
        body,
        headers: headersOf(who, target),
        may2xx: target.may2xx ?? false,
        junkAddress,
        refusedTo: target.refusedTo,
      });
    }
  }
  return requests;
}

function printReport(): void {
  if (!tallies.length) return;
  const lines = tallies.map(({ route, tally }) => {
    const statuses = Object.entries(tally.byStatus)
      .map(([status, n]) => `${status}×${n}`)
      .join(" ");
    return `${route.padEnd(58)} ${String(tally.sent).padStart(5)} sent  ${(tally.elapsedMs / 1000).toFixed(1).padStart(5)} s  ${statuses}`;
  });
  const total = tallies.reduce((n, t) => n + t.tally.sent, 0);
  const seconds = tallies.reduce((s, t) => s + t.tally.elapsedMs, 0) / 1000;
  console.log(
    [
      `[fuzz] seed ${SEED}; ${tallies.length} routes, ${total} requests in ${seconds.toFixed(0)} s`,
      ...lines,
      `[fuzz] left out of the database digest: ${Object.entries(TABLES_LEFT_OUT)
        .map(([t, why]) => `${t} (${why})`)
        .join("; ")}; ${Object.entries(COLUMNS_LEFT_OUT)
        .map(([t, { columns, why }]) => `${t}.${columns.join("/")} (${why})`)
        .join("; ")}`,
    ].join("\n"),
  );
}

const routes: (MutatingRoute | { method: "POST"; template: string; roles: readonly string[] })[] = [
  ...listMutatingRoutes(),
  ...AUTH_ENDPOINTS.map((template) => ({ method: "POST" as const, template, roles: [] })),
];

describe("the fuzz's list of routes", () => {
  it("has a target for every state-changing route in app/api and for each auth endpoint, and none for a route that is gone", () => {
    const keys = routes.map((r) => `${r.method} ${r.template}`);
    expect(keys).toContain("PUT /api/setups/[id]");
    expect(keys.length).toBeGreaterThanOrEqual(40);
    expect(Object.keys(targets()).sort()).toEqual([...keys].sort());
  });
});

describe("fuzzing every state-changing route", () => {
  for (const route of routes) {
    const key = `${route.method} ${route.template}`;
    it(`answers ${key} with no 5xx and writes nothing for ${BODIES_PER_ROUTE}+ bad bodies`, { timeout: 120_000 }, async () => {
      const target = targets()[key];
      expect(target, `no fuzz target for ${key}`).toBeDefined();
      const requests = requestsFor(route, target);
      const s3 = target.multipart ? s3Client() : null;
      const keysBefore = s3 ? await listObjectKeys(s3.client, s3.bucket) : [];
      const before = await digestDatabase(database.client);
      const tally = await runFuzz(baseURL, requests, CONCURRENCY);
      const after = await digestDatabase(database.client);
      tallies.push({ route: key, tally });
      console.log(`[fuzz] ${key}: ${tally.sent} in ${(tally.elapsedMs / 1000).toFixed(1)} s`, JSON.stringify(tally.byStatus));
      expect(tally.failures.slice(0, 5), `${tally.failures.length} wrong answers`).toEqual([]);
      expect(tally.sent).toBeGreaterThanOrEqual(BODIES_PER_ROUTE);
      expect(changedTables(before, after), "tables changed by refused requests").toEqual([]);
      if (s3) expect((await listObjectKeys(s3.client, s3.bucket)).sort()).toEqual(keysBefore.sort());
    });
  }

  it("leaves the signed-in clients signed in (the fuzz did not end their sessions)", async () => {
    for (const who of ["customer", "support", "maker"] as const) expect((await clients[who].get("/api/setups")).status, who).toBe(200);
  });
});

function s3Client() {
  const config = storageConfig(inject("s3Env"))!;
  return { client: createS3Client(config), bucket: config.bucket };
}
