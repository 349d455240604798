import { spawn, spawnSync } from "node:child_process";
import { mkdirSync } from "node:fs";
import { ensureLocalEnv } from "./local-env";
import { startLocalMail } from "./local-mail";
import { startLocalStorage } from "./local-storage";

// `next dev` with the same preparation as the demo (secret, migrations, demo data).
// Next would otherwise try to send usage data over the internet.
process.env.NEXT_TELEMETRY_DISABLED ??= "1";
ensureLocalEnv({ BETTER_AUTH_URL: `http://localhost:${process.env.PORT ?? "3000"}` });
mkdirSync("data", { recursive: true });
for (const script of ["scripts/migrate.ts", "scripts/seed.ts"]) {
  const result = spawnSync("npx", ["tsx", script], { stdio: "inherit", env: process.env });
  if (result.status !== 0) process.exit(result.status ?? 1);
}
await startLocalMail();
await startLocalStorage();
const server = spawn("npx", ["next", "dev", "-p", process.env.PORT ?? "3000"], { stdio: "inherit", env: process.env });
server.on("exit", (code) => process.exit(code ?? 0));
