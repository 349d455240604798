/**
 * `npm run bench:review`: the review desk's queue over a database of many setups (build it first
 * with `npm run seed:large`), against a production build. Prints, per query, the median and p95
 * of the response time, and SQLite's plan for its order (a "TEMP B-TREE" means a sort in memory).
 * Reuses an existing build when TRIMRAIL_REUSE_BUILD=1.
 */
import { existsSync } from "node:fs";
import { openDatabase } from "../db/index";
import { startAppServer } from "../tests/support/app-server";
import { ApiClient } from "../tests/support/http";

const url = process.env.TRIMRAIL_LARGE_DATABASE_URL ?? "file:./data/large.db";
if (url.startsWith("file:") && !existsSync(url.slice(5))) {
  console.error(`No database at ${url}: run \`npm run seed:large\` first.`);
  process.exit(2);
}
const ROUNDS = 60;
const QUERIES: [string, string][] = [
  ["waiting longest first (the desk's default)", "status=submitted&sort=waiting&dir=desc&pageSize=50"],
  ["submitted, newest first", "status=submitted&sort=submittedAt&dir=desc&pageSize=50"],
  ["page 100 of the default", "status=submitted&sort=waiting&dir=desc&pageSize=50&page=100"],
  ["thinnest free lift first", "status=submitted&sort=freeLiftRatio&dir=asc&pageSize=50"],
  ["heaviest payload first", "status=submitted&sort=payloadMassKg&dir=desc&pageSize=50"],
  ["worst flag stop", "status=submitted&worst=stop&pageSize=50"],
  ["one envelope model", "status=submitted&model=mdl-ridge-11&pageSize=50"],
  ["search a customer name", "status=submitted&q=Lark&pageSize=50"],
  ["any reviewed or waiting", "status=any&sort=submittedAt&dir=desc&pageSize=50"],
];

const { client } = openDatabase(url);
const counted = await client.execute("select status, count(*) as n from setups group by status");
console.log(`setups by status: ${counted.rows.map((r) => `${String(r.status)} ${String(r.n)}`).join(", ")}`);
const plans: Record<string, string> = {
  submittedAt: "select id from setups where status = 'submitted' order by submitted_at desc, id desc limit 50",
  freeLiftRatio: "select id from setups where status = 'submitted' order by free_lift_ratio asc, id asc limit 50",
  payloadMassKg: "select id from setups where status = 'submitted' order by payload_mass_kg desc, id desc limit 50",
};
for (const [name, query] of Object.entries(plans)) {
  const plan = await client.execute(`explain query plan ${query}`);
  console.log(`plan, order by ${name}: ${plan.rows.map((r) => String(r.detail)).join(" | ")}`);
}
client.close();

const app = await startAppServer({ build: process.env.TRIMRAIL_REUSE_BUILD !== "1", databaseUrl: url });
try {
  const support = new ApiClient(app.baseURL);
  if ((await support.signIn("support@trimrail.test")).status !== 200) throw new Error("support could not sign in");
  const percentile = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * p))];
  console.log(`\n${"query".padEnd(44)} ${"median".padStart(8)} ${"p95".padStart(8)}  rows/total`);
  for (const [label, query] of QUERIES) {
    const times: number[] = [];
    let summary = "";
    for (let i = 0; i < ROUNDS + 5; i += 1) {
      const started = performance.now();
      const response = await support.get(`/api/review/queue?${query}`);
      const body = (await response.json()) as { rows: unknown[]; total: number };
      const ms = performance.now() - started;
      if (response.status !== 200) throw new Error(`${query}: ${response.status}`);
      if (i >= 5) times.push(ms);
      summary = `${body.rows.length}/${body.total}`;
    }
    times.sort((a, b) => a - b);
    console.log(
      `${label.padEnd(44)} ${percentile(times, 0.5).toFixed(1).padStart(6)} ms ${percentile(times, 0.95).toFixed(1).padStart(6)} ms  ${summary}`,
    );
  }
} finally {
  await app.stop();
}
