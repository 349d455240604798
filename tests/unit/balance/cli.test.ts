import { execFileSync, spawnSync } from "node:child_process";
import { fileURLToPath } from "node:url";
import { describe, expect, it } from "vitest";

const root = fileURLToPath(new URL("../../../", import.meta.url));
const tsx = `${root}node_modules/.bin/tsx`;
const CONTRACT_FIELDS = [
  "airDensityKgM3", "gasDensityKgM3", "grossLiftKg", "totalMassKg", "freeLiftKg", "freeLiftRatio",
  "centreOfMass", "calmTrimDeg", "wind", "gust", "maxTetherOutM", "helium", "flags",
];

describe("scripts/balance.ts", () => {
  it("prints a BalanceResult with the contract's field names for the demo fixture", () => {
    const stdout = execFileSync(tsx, ["scripts/balance.ts", "tests/fixtures/demo-setup.json"], { cwd: root, encoding: "utf8" });
    const result = JSON.parse(stdout) as Record<string, unknown>;
    for (const field of CONTRACT_FIELDS) expect(result).toHaveProperty(field);
    expect(result.helium).toHaveProperty("fillVolumeM3");
    expect(result.wind).toHaveProperty("tetherAngleDeg");
  }, 30_000);

  it("reads standard input with '-' and exits 2 with the zod issues' paths on bad input", () => {
    const run = spawnSync(tsx, ["scripts/balance.ts", "-"], {
      cwd: root, encoding: "utf8", input: JSON.stringify({ mount: {}, payloads: [], gas: { purity: 1.5 } }),
    });
    expect(run.status).toBe(2);
    expect(run.stderr).toContain("envelope: envelope is required");
    expect(run.stderr).toContain("gas.purity: helium purity (fraction) must be at most 1");
    expect(run.stdout).toBe("");
  }, 30_000);
});
