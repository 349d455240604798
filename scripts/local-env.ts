import { randomBytes } from "node:crypto";
import { existsSync, readFileSync, writeFileSync, appendFileSync } from "node:fs";

const ENV_FILE = ".env.local";

function parseEnvFile(text: string): Record<string, string> {
  const out: Record<string, string> = {};
  for (const line of text.split(/\r?\n/)) {
    const match = /^\s*([A-Z0-9_]+)\s*=\s*(.*)\s*$/.exec(line);
    if (match) out[match[1]] = match[2].replace(/^["']|["']$/g, "");
  }
  return out;
}

/**
 * Makes sure a better-auth secret exists: taken from the environment, else from .env.local, else
 * generated into .env.local (git-ignored) so sessions survive restarts of the demo.
 * Loads .env.local into process.env without overriding what the shell already set.
 */
export function ensureLocalEnv(defaults: Record<string, string> = {}): void {
  const fromFile = existsSync(ENV_FILE) ? parseEnvFile(readFileSync(ENV_FILE, "utf8")) : {};
  if (!process.env.BETTER_AUTH_SECRET && !fromFile.BETTER_AUTH_SECRET) {
    const secret = randomBytes(32).toString("base64url");
    if (existsSync(ENV_FILE)) appendFileSync(ENV_FILE, `\nBETTER_AUTH_SECRET=${secret}\n`);
    else writeFileSync(ENV_FILE, `# Written by Trimrail on first run; keep it out of git.\nBETTER_AUTH_SECRET=${secret}\n`);
    fromFile.BETTER_AUTH_SECRET = secret;
    console.log(`[trimrail] generated BETTER_AUTH_SECRET into ${ENV_FILE}`);
  }
  for (const [key, value] of Object.entries({ ...defaults, ...fromFile })) {
    process.env[key] ??= value;
  }
}
