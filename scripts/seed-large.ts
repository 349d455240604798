import { mkdirSync } from "node:fs";
import { openDatabase } from "../db/index";
import { migrateDatabase } from "../db/migrate";
import { seedDemo } from "../db/seed";
import { seedLarge } from "../db/seed-large";

// `npm run seed:large [-- --setups N]`: the demo plus N invented setups (default 100,000) in a
// database of its own (TRIMRAIL_LARGE_DATABASE_URL, default data/large.db), for the benchmarks.
const arg = process.argv.indexOf("--setups");
const setups = arg > 0 ? Number(process.argv[arg + 1]) : 100_000;
if (!Number.isInteger(setups) || setups < 0) {
  console.error("--setups takes a whole number");
  process.exit(2);
}
const url = process.env.TRIMRAIL_LARGE_DATABASE_URL ?? "file:./data/large.db";
mkdirSync("data", { recursive: true });
const { db, client } = openDatabase(url);
const started = performance.now();
await migrateDatabase(db);
await seedDemo(db);
await seedLarge(db, {
  setups,
  customers: Math.max(1, Math.round(setups / 50)),
  onProgress: (n) => {
    if (n % 10_000 === 0 || n === setups) process.stdout.write(`  ${n} setups\n`);
  },
});
client.close();
console.log(`[trimrail] ${setups} setups in ${url} (${((performance.now() - started) / 1000).toFixed(1)} s)`);
