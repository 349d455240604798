/**
 * `npm run bench:api`: every list and Insight endpoint, and the Setups and Review desk pages, at
 * the demo's 20 setups and over the large database (`npm run seed:large`, 100,000 setups):
 * unloaded median and p95, then 50 connections for 10 s on each list (req/s, errors, server RSS).
 * Against a production build; TRIMRAIL_REUSE_BUILD=1 reuses the last test build.
 */
import { existsSync } from "node:fs";
import { hashPassword } from "better-auth/crypto";
import { openDatabase } from "../db/index";
import { DEMO_PASSWORD } from "../db/seed-data";
import { LARGE_SIGN_IN_EMAIL } from "../db/seed-large";
import { startAppServer, type AppServer } from "../tests/support/app-server";
import { ApiClient } from "../tests/support/http";
import { treeRssBytes } from "../tests/support/process-memory";

const ROUNDS = 40;
const LOAD_S = 10;
const CONNECTIONS = 50;
const largeUrl = process.env.TRIMRAIL_LARGE_DATABASE_URL ?? "file:./data/large.db";
const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * p))];

interface Target {
  label: string;
  who: "customer" | "support" | "maker";
  path: string;
  list: boolean;
}

async function targetsFor(app: AppServer, customer: ApiClient): Promise<Target[]> {
  const own = (await (await customer.get("/api/setups?pageSize=1")).json()) as { setups: Array<{ id: string }>; total: number };
  const someId = own.setups[0]?.id ?? "set-wren-whip";
  void app;
  return [
    { label: `GET /api/setups (page 1 of ${own.total})`, who: "customer", path: "/api/setups?pageSize=25", list: true },
    { label: "GET /api/review/queue (default)", who: "support", path: "/api/review/queue?pageSize=50&sort=waiting&dir=desc", list: true },
    {
      label: "GET /api/review/queue (thinnest lift)",
      who: "support",
      path: "/api/review/queue?pageSize=50&sort=freeLiftRatio&dir=asc",
      list: true,
    },
    { label: "GET /api/review/queue (search)", who: "support", path: "/api/review/queue?pageSize=50&q=Lark", list: true },
    { label: "GET /api/setups/:id/comments", who: "customer", path: `/api/setups/${someId}/comments`, list: true },
    { label: "GET /api/setups/:id/history", who: "customer", path: `/api/setups/${someId}/history`, list: true },
    { label: "GET /api/insight", who: "maker", path: "/api/insight", list: false },
    { label: "GET /api/insight?model=", who: "maker", path: "/api/insight?model=mdl-ridge-11", list: false },
    { label: "GET /api/catalogue/units", who: "maker", path: "/api/catalogue/units", list: true },
    { label: "GET /api/catalogue/templates", who: "maker", path: "/api/catalogue/templates", list: true },
    { label: "GET /api/catalogue/models", who: "maker", path: "/api/catalogue/models", list: true },
    { label: "page /setups", who: "customer", path: "/setups", list: false },
    { label: "page /review", who: "support", path: "/review", list: false },
    { label: "page /workshop/people (page 1)", who: "maker", path: "/workshop/people", list: false },
    { label: "page /workshop/people (page 80)", who: "maker", path: "/workshop/people?page=80", list: false },
    { label: "page /workshop/units", who: "maker", path: "/workshop/units", list: false },
  ];
}

async function unloaded(client: ApiClient, path: string): Promise<{ median: number; p95: number }> {
  const times: number[] = [];
  for (let i = 0; i < ROUNDS + 5; i += 1) {
    const started = performance.now();
    const response = await client.get(path);
    await response.arrayBuffer();
    if (response.status !== 200) throw new Error(`${path}: ${response.status}`);
    if (i >= 5) times.push(performance.now() - started);
  }
  times.sort((a, b) => a - b);
  return { median: percentile(times, 0.5), p95: percentile(times, 0.95) };
}

async function loaded(client: ApiClient, path: string, serverPid: number): Promise<{ rps: number; errors: number; rssMB: number }> {
  const deadline = performance.now() + LOAD_S * 1000;
  let done = 0;
  let errors = 0;
  let rss = treeRssBytes(serverPid);
  const sampler = setInterval(() => (rss = Math.max(rss, treeRssBytes(serverPid))), 250);
  await Promise.all(
    Array.from({ length: CONNECTIONS }, async () => {
      while (performance.now() < deadline) {
        try {
          const response = await client.get(path);
          await response.arrayBuffer();
          if (response.status === 200) done += 1;
          else errors += 1;
        } catch {
          errors += 1;
        }
      }
    }),
  );
  clearInterval(sampler);
  return { rps: done / LOAD_S, errors, rssMB: rss / 2 ** 20 };
}

async function run(label: string, databaseUrl: string | undefined, customerEmail: string): Promise<void> {
  const app = await startAppServer({ build: process.env.TRIMRAIL_REUSE_BUILD !== "1", databaseUrl });
  try {
    const clients = { customer: new ApiClient(app.baseURL), support: new ApiClient(app.baseURL), maker: new ApiClient(app.baseURL) };
    for (const [who, email] of [
      ["customer", customerEmail],
      ["support", "support@trimrail.test"],
      ["maker", "maker@trimrail.test"],
    ] as const) {
      const response = await clients[who].signIn(email);
      if (response.status !== 200) throw new Error(`${email} could not sign in (${response.status})`);
    }
    console.log(`\n## ${label}\n`);
    console.log(
      `${"request".padEnd(40)} ${"median".padStart(9)} ${"p95".padStart(9)} ${"req/s @50".padStart(10)} ${"errors".padStart(7)} ${"RSS MB".padStart(7)}`,
    );
    for (const target of await targetsFor(app, clients.customer)) {
      const quiet = await unloaded(clients[target.who], target.path);
      const load = target.list ? await loaded(clients[target.who], target.path, app.serverPid) : null;
      console.log(
        `${target.label.padEnd(40)} ${quiet.median.toFixed(1).padStart(6)} ms ${quiet.p95.toFixed(1).padStart(6)} ms ${load ? load.rps.toFixed(0).padStart(10) : "".padStart(10)} ${load ? String(load.errors).padStart(7) : "".padStart(7)} ${load ? load.rssMB.toFixed(0).padStart(7) : "".padStart(7)}`,
      );
    }
  } finally {
    await app.stop();
  }
}

await run("the demo (20 setups)", undefined, "customer@trimrail.test");
if (largeUrl.startsWith("file:") && !existsSync(largeUrl.slice(5))) {
  console.log(`\nNo large database at ${largeUrl}: run \`npm run seed:large\` for the 100,000-setup figures.`);
} else {
  // A large database seeded before its customer had an account gets one now.
  const { client } = openDatabase(largeUrl);
  await client.execute({
    sql: "insert or ignore into account (id, account_id, provider_id, user_id, password) select 'acc-' || id, id, 'credential', id, ? from user where email = ?",
    args: [await hashPassword(DEMO_PASSWORD), LARGE_SIGN_IN_EMAIL],
  });
  const count = await client.execute("select count(*) as n from setups");
  client.close();
  await run(`the large database (${String(count.rows[0].n)} setups)`, largeUrl, LARGE_SIGN_IN_EMAIL);
}
