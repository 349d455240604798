import { describe, expect, it } from "vitest";
import { balanceInputSchema } from "@/lib/balance";
import { demoSetup } from "./setups";

function issuesOf(input: unknown): { path: string; message: string }[] {
  const parsed = balanceInputSchema.safeParse(input);
  if (parsed.success) return [];
  return parsed.error.issues.map((issue) => ({ path: issue.path.join("."), message: issue.message }));
}

describe("balanceInputSchema", () => {
  it("accepts the demo setup unchanged", () => {
    const setup = demoSetup();
    const parsed = balanceInputSchema.parse(setup);
    expect(parsed).toEqual(setup);
  });

  it.each([
    ["NaN", Number.NaN],
    ["Infinity", Number.POSITIVE_INFINITY],
    ["-Infinity", Number.NEGATIVE_INFINITY],
  ])("rejects %s with the field's path and name", (_, value) => {
    const setup = demoSetup();
    const issues = issuesOf({ ...setup, envelope: { ...setup.envelope, gasVolumeM3: value } });
    expect(issues).toEqual([{ path: "envelope.gasVolumeM3", message: "gas volume (m³) must be a finite number" }]);
  });

  it("rejects a negative mass", () => {
    const setup = demoSetup();
    const issues = issuesOf({ ...setup, payloads: [{ ...setup.payloads[0], massKg: -0.1 }] });
    expect(issues).toEqual([{ path: "payloads.0.massKg", message: "payload mass (kg) must be at least 0" }]);
  });

  it("rejects purity 1.5", () => {
    const setup = demoSetup();
    const issues = issuesOf({ ...setup, gas: { purity: 1.5 } });
    expect(issues).toEqual([{ path: "gas.purity", message: "helium purity (fraction) must be at most 1" }]);
  });

  it("rejects a missing envelope", () => {
    const { envelope: _omit, ...setup } = demoSetup();
    expect(issuesOf(setup)).toEqual([{ path: "envelope", message: "envelope is required" }]);
  });

  it("rejects an unknown thread and a rail that runs backwards", () => {
    const setup = demoSetup();
    const issues = issuesOf({
      ...setup,
      mount: { ...setup.mount, thread: "M6" },
      envelope: { ...setup.envelope, rail: { startX: 1, endX: 0.5, z: -0.5 } },
    });
    expect(issues.map((issue) => issue.path).sort()).toEqual(["envelope.rail.endX", "mount.thread"]);
  });

  it("accepts a mount off the rail (that is a flag, not an input error)", () => {
    const setup = demoSetup();
    expect(issuesOf({ ...setup, mount: { ...setup.mount, positionX: 50 } })).toEqual([]);
  });
});
