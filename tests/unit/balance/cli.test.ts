import { execFileSync, spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import os from "node:os";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { evaluateBalance, operatingEnvelope, type BalanceInput } from "@/lib/balance";

const root = fileURLToPath(new URL("../../../", import.meta.url));
const tsx = `${root}node_modules/.bin/tsx`;
const FIXTURE_PATH = "tests/fixtures/demo-setup.json";
const fixtureText = readFileSync(`${root}${FIXTURE_PATH}`, "utf8");
const fixture = (): BalanceInput => JSON.parse(fixtureText) as BalanceInput;
const CONTRACT_FIELDS = [
  "airDensityKgM3",
  "gasDensityKgM3",
  "grossLiftKg",
  "totalMassKg",
  "freeLiftKg",
  "freeLiftRatio",
  "centreOfMass",
  "calmTrimDeg",
  "wind",
  "gust",
  "maxTetherOutM",
  "helium",
  "flags",
];

/** What the CLI prints: the engine's result as JSON would carry it. */
const asJson = (value: unknown): unknown => JSON.parse(JSON.stringify(value));

function runCli(args: string[], stdin?: string) {
  return spawnSync(tsx, ["scripts/balance.ts", ...args], { cwd: root, encoding: "utf8", input: stdin, timeout: 60_000 });
}

describe("scripts/balance.ts", () => {
  let dir: string;
  beforeAll(() => {
    dir = mkdtempSync(path.join(os.tmpdir(), "trimrail-cli-"));
  });
  afterAll(() => rmSync(dir, { recursive: true, force: true }));

  it("prints a BalanceResult with the contract's field names for the demo fixture", () => {
    const stdout = execFileSync(tsx, ["scripts/balance.ts", FIXTURE_PATH], { cwd: root, encoding: "utf8" });
    const result = JSON.parse(stdout) as Record<string, unknown>;
    for (const field of CONTRACT_FIELDS) expect(result).toHaveProperty(field);
    expect(result.helium).toHaveProperty("fillVolumeM3");
    expect(result.wind).toHaveProperty("tetherAngleDeg");
  }, 30_000);

  it("returns the engine's result from a file and from standard input when given the demo fixture", () => {
    const direct = asJson(evaluateBalance(fixture()));
    const fromFile = runCli([FIXTURE_PATH]);
    expect(fromFile.status, fromFile.stderr).toBe(0);
    expect(JSON.parse(fromFile.stdout)).toEqual(direct);

    const fromStdin = runCli(["-"], fixtureText);
    expect(fromStdin.status, fromStdin.stderr).toBe(0);
    expect(JSON.parse(fromStdin.stdout)).toEqual(direct);
    // the fixture is a real flying setup, so the comparison is not between two empty answers
    const result = JSON.parse(fromFile.stdout) as { grossLiftKg: number; flags: Array<{ message: string }> };
    expect(result.grossLiftKg).toBeGreaterThan(0);
    expect(result.flags.length).toBeGreaterThan(0);
    // the CLI prints each flag's plain English message with its data
    for (const flag of result.flags) expect(flag.message.length).toBeGreaterThan(0);
  }, 30_000);

  it("reads standard input with '-' and exits 2 with the zod issues' paths on bad input", () => {
    const run = runCli(["-"], JSON.stringify({ mount: {}, payloads: [], gas: { purity: 1.5 } }));
    expect(run.status).toBe(2);
    expect(run.stderr).toContain("envelope: envelope is required");
    expect(run.stderr).toContain("gas.purity: helium purity (fraction) must be at most 1");
    expect(run.stdout).toBe("");
  }, 30_000);

  it("returns exit status 2 with the zod paths on stderr when the file is invalid", () => {
    const bad = fixture();
    bad.payloads[1].massKg = -1;
    bad.gas = { ...bad.gas, purity: 1.5 };
    const file = path.join(dir, "bad.json");
    writeFileSync(file, JSON.stringify(bad));
    const run = runCli([file]);
    expect(run.status).toBe(2);
    expect(run.stdout).toBe("");
    expect(run.stderr).toContain("payloads.1.massKg");
    expect(run.stderr).toContain("gas.purity");
  }, 30_000);

  it("returns exit status 2 with a message when the file is not JSON or does not exist", () => {
    const file = path.join(dir, "broken.json");
    writeFileSync(file, '{"envelope":{"gasVolumeM3":NaN}}');
    const broken = runCli([file]);
    expect(broken.status).toBe(2);
    expect(broken.stdout).toBe("");
    expect(broken.stderr).toMatch(/not valid JSON/);

    const missing = runCli([path.join(dir, "nowhere.json")]);
    expect(missing.status).toBe(2);
    expect(missing.stderr).toMatch(/cannot read/);
  }, 30_000);

  it("returns the engine's operating envelope with --envelope, its options from flags", () => {
    const run = runCli(["--envelope", FIXTURE_PATH, "--target-height", "30", "--winds", "4", "--lines", "3"]);
    expect(run.status, run.stderr).toBe(0);
    const printed = JSON.parse(run.stdout) as { windsMS: number[]; linesOutM: number[]; target: { lineOutM: number | null } };
    expect(printed).toEqual(asJson(operatingEnvelope(fixture(), { targetHeightM: 30, windCount: 4, lineCount: 3 })));
    expect(printed.windsMS).toEqual([0, 5, 10, 15]);
    expect(printed.linesOutM).toHaveLength(3);
    expect(printed.target.lineOutM).toBeGreaterThan(30);

    const fromStdin = runCli(["--envelope", "-"], fixtureText);
    expect(fromStdin.status, fromStdin.stderr).toBe(0);
    expect(JSON.parse(fromStdin.stdout)).toEqual(asJson(operatingEnvelope(fixture())));
  }, 60_000);

  it("returns exit status 2 with the option's path when an --envelope option is out of range or unknown", () => {
    const bad = runCli(["--envelope", FIXTURE_PATH, "--winds", "1"]);
    expect(bad.status).toBe(2);
    expect(bad.stdout).toBe("");
    expect(bad.stderr).toContain("windCount: wind count must be at least 2");
    const unknown = runCli(["--envelope", FIXTURE_PATH, "--colour", "red"]);
    expect(unknown.status).toBe(2);
    expect(unknown.stderr).toContain("unknown argument --colour");
  }, 30_000);
});
