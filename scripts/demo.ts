import { spawn, spawnSync } from "node:child_process";
import { mkdirSync } from "node:fs";
import { DEMO_PASSWORD, DEMO_USERS } from "../db/seed-data";
import { ensureLocalEnv } from "./local-env";
import { nextCommand } from "./next-bin";
import { startLocalMail } from "./local-mail";
import { startLocalStorage } from "./local-storage";

// One command for a fresh clone: secret, database, migrations, demo data, production build, serve.
const port = process.env.PORT ?? "3000";
const url = `http://localhost:${port}`;
// Next would otherwise try to send usage data over the internet.
process.env.NEXT_TELEMETRY_DISABLED ??= "1";
ensureLocalEnv({ BETTER_AUTH_URL: url });
mkdirSync("data", { recursive: true });

function step(label: string, command: string, args: string[]): void {
  console.log(`\n[trimrail] ${label}`);
  const result = spawnSync(command, args, { stdio: "inherit", env: process.env });
  if (result.status !== 0) {
    console.error(`[trimrail] ${label} failed (exit ${result.status ?? result.signal})`);
    process.exit(result.status ?? 1);
  }
}

step("migrating the database", "npx", ["tsx", "scripts/migrate.ts"]);
step("seeding the demo data", "npx", ["tsx", "scripts/seed.ts"]);
if (process.env.TRIMRAIL_SKIP_BUILD !== "1") step("building the app (about a minute)", ...nextCommand(["build"]));

await startLocalMail();
await startLocalStorage();
const server = spawn(...nextCommand(["start", "-p", port]), { stdio: ["ignore", "pipe", "inherit"], env: process.env });
server.stdout.on("data", (chunk: Buffer) => {
  process.stdout.write(chunk);
  if (chunk.toString().includes("Ready")) {
    const staff = DEMO_USERS;
    console.log(`\n  Trimrail is running at ${url}\n`);
    console.log("  Demo sign-ins (password for all: " + DEMO_PASSWORD + ")");
    for (const u of staff) console.log(`    ${u.role.padEnd(9)} ${u.email.padEnd(24)} ${u.name}`);
    console.log("\n  Press Ctrl+C to stop.\n");
  }
});
for (const signal of ["SIGINT", "SIGTERM"] as const) process.on(signal, () => server.kill(signal));
server.on("exit", (code) => process.exit(code ?? 0));
