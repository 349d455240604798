/**
 * `npm run balance -- <setup.json | ->`: evaluate one setup and print its BalanceResult as JSON.
 * `npm run balance -- --envelope <setup.json | -> [--target-height M] [--target-wind M/S]
 *   [--max-wind M/S] [--winds N] [--lines N]`: print the setup's operating envelope as JSON (the
 *   same as POST /api/balance/envelope with `{ setup, options }`).
 * Bad input (unreadable, not JSON, failing the schema, or an unknown option) prints the problems to
 * stderr and exits with status 2.
 */
import { readFileSync } from "node:fs";
import type { z } from "zod";
import { balanceInputSchema, envelopeOptionsSchema, evaluateBalance, operatingEnvelope } from "../lib/balance";

const USAGE =
  "usage: npm run balance -- [--envelope [--target-height M] [--target-wind M/S] [--max-wind M/S] [--winds N] [--lines N]] <setup.json | ->";

function fail(lines: readonly string[]): never {
  for (const line of lines) process.stderr.write(`${line}\n`);
  process.exit(2);
}

function readSource(argument: string | undefined): string {
  if (!argument) fail([USAGE]);
  try {
    return readFileSync(argument === "-" ? 0 : argument, "utf8");
  } catch (error) {
    fail([`cannot read ${argument === "-" ? "standard input" : argument}: ${(error as Error).message}`]);
  }
}

function parsedOrFail<T>(schema: z.ZodType<T>, value: unknown, what: string): T {
  const parsed = schema.safeParse(value);
  if (parsed.success) return parsed.data;
  fail([
    `invalid ${what}:`,
    ...parsed.error.issues.map((issue) => `  ${issue.path.length ? issue.path.join(".") : "(root)"}: ${issue.message}`),
  ]);
}

// The envelope's options by flag name, each a number.
const OPTION_FLAGS: Readonly<Record<string, string>> = {
  "--target-height": "targetHeightM",
  "--target-wind": "targetWindMS",
  "--max-wind": "maxWindMS",
  "--winds": "windCount",
  "--lines": "lineCount",
};

const args = process.argv.slice(2);
const envelope = args[0] === "--envelope";
const rest = envelope ? args.slice(1) : args;
const options: Record<string, number> = {};
let file: string | undefined;
for (let i = 0; i < rest.length; i++) {
  const key = OPTION_FLAGS[rest[i]];
  if (key && envelope) {
    options[key] = Number(rest[i + 1]);
    i += 1;
  } else if (rest[i].startsWith("--") || file !== undefined) {
    fail([`unknown argument ${rest[i]}`, USAGE]);
  } else {
    file = rest[i];
  }
}

const source = readSource(file);
let json: unknown;
try {
  json = JSON.parse(source);
} catch (error) {
  fail([`not valid JSON: ${(error as Error).message}`]);
}

const setup = parsedOrFail(balanceInputSchema, json, "setup");
const output = envelope ? operatingEnvelope(setup, parsedOrFail(envelopeOptionsSchema, options, "options")) : evaluateBalance(setup);
process.stdout.write(`${JSON.stringify(output, null, 2)}\n`);
