/**
 * `npm run balance -- <setup.json | ->`: evaluate one setup and print its BalanceResult as JSON.
 * Bad input (unreadable, not JSON, or failing the schema) prints the problems to stderr and
 * exits with status 2.
 */
import { readFileSync } from "node:fs";
import { balanceInputSchema, evaluateBalance } from "../lib/balance";

function fail(lines: readonly string[]): never {
  for (const line of lines) process.stderr.write(`${line}\n`);
  process.exit(2);
}

function readSource(argument: string | undefined): string {
  if (!argument) fail(["usage: npm run balance -- <setup.json | ->"]);
  try {
    return readFileSync(argument === "-" ? 0 : argument, "utf8");
  } catch (error) {
    fail([`cannot read ${argument === "-" ? "standard input" : argument}: ${(error as Error).message}`]);
  }
}

const source = readSource(process.argv[2]);
let json: unknown;
try {
  json = JSON.parse(source);
} catch (error) {
  fail([`not valid JSON: ${(error as Error).message}`]);
}

const parsed = balanceInputSchema.safeParse(json);
if (!parsed.success) {
  fail([
    "invalid setup:",
    ...parsed.error.issues.map((issue) => `  ${issue.path.length ? issue.path.join(".") : "(root)"}: ${issue.message}`),
  ]);
}

process.stdout.write(`${JSON.stringify(evaluateBalance(parsed.data), null, 2)}\n`);
