import { describe, expect, it } from "vitest";
import {
  evaluateBalance,
  ksiToPascals,
  newtonsToPoundsForce,
  squareInchesToSquareMetres,
  tensileStressAreaSquareInches,
  threadProofLoadN,
  threadStressAreaM2,
  type BalanceInput,
} from "@/lib/balance";
import { demoSetup, flagLevels, symmetricSetup } from "./setups";

describe("tensileStressAreaSquareInches", () => {
  it("gives 0.0318 in² (20.53 mm²) for 1/4-20 UNC (ASME B1.1: As = 0.7854·(D − 0.9743/n)²)", () => {
    expect(tensileStressAreaSquareInches(0.25, 20)).toBeCloseTo(0.0318, 4);
    expect(threadStressAreaM2("1/4-20 UNC") * 1e6).toBeCloseTo(20.53, 1);
  });

  it("gives 0.0775 in² for 3/8-16 UNC (ASME B1.1, same formula)", () => {
    expect(tensileStressAreaSquareInches(0.375, 16)).toBeCloseTo(0.0775, 4);
    expect(Math.abs(threadStressAreaM2("3/8-16 UNC") / squareInchesToSquareMetres(0.0775) - 1)).toBeLessThan(5e-4);
  });
});

describe("threadProofLoadN", () => {
  it("gives ≈ 1,750 lbf (7.79 kN) for 1/4-20 UNC in SAE J429 grade 2 (proof 55 ksi; derived)", () => {
    const proofN = threadProofLoadN("1/4-20 UNC", ksiToPascals(55));
    expect(newtonsToPoundsForce(proofN)).toBeCloseTo(tensileStressAreaSquareInches(0.25, 20) * 55_000, 6);
    expect(Math.abs(newtonsToPoundsForce(proofN) - 1750)).toBeLessThan(5);
    expect(proofN / 1000).toBeCloseTo(7.79, 1);
  });

  it("is weaker for ISO 898-1 class 4.6 (proof 225 MPa) than SAE J429 grade 2", () => {
    expect(threadProofLoadN("1/4-20 UNC", 225e6)).toBeLessThan(threadProofLoadN("1/4-20 UNC", ksiToPascals(55)));
  });
});

function withPayload(overrides: Partial<BalanceInput["payloads"][number]>, mount: Partial<BalanceInput["mount"]> = {}): BalanceInput {
  const setup = symmetricSetup();
  return {
    ...setup,
    mount: { ...setup.mount, safetyLineBreakingLoadN: 300, ...mount },
    payloads: [{ ...setup.payloads[0], ...overrides }],
  };
}

describe("evaluateBalance attachment flags", () => {
  it("stops a thread mismatch without an adapter", () => {
    const result = evaluateBalance(withPayload({ attachment: "3/8-16 UNC" }));
    expect(flagLevels(result, "thread-mismatch")).toEqual(["stop"]);
    expect(result.flags.find((f) => f.code === "thread-mismatch")?.message).toMatch(/3\/8-16 UNC.*1\/4-20 UNC/);
  });

  it("accepts a mismatch bridged by an adapter and adds the adapter's mass", () => {
    const bare = evaluateBalance(withPayload({}));
    const adapted = evaluateBalance(
      withPayload({
        attachment: "3/8-16 UNC",
        adapter: { massKg: 0.01, from: "3/8-16 UNC", to: "1/4-20 UNC" },
      }),
    );
    expect(flagLevels(adapted, "thread-mismatch")).toEqual(["ok"]);
    expect(adapted.totalMassKg - bare.totalMassKg).toBeCloseTo(0.01, 12);
  });

  it("stops an adapter that does not bridge the payload and the mount", () => {
    const result = evaluateBalance(
      withPayload({
        attachment: "3/8-16 UNC",
        adapter: { massKg: 0.01, from: "1/4-20 UNC", to: "1/4-20 UNC" },
      }),
    );
    expect(flagLevels(result, "adapter-mismatch")).toEqual(["stop"]);
  });

  it("returns one thread flag naming both when two identical payloads share a thread", () => {
    const setup = demoSetup();
    const logger = setup.payloads[1];
    const twins = evaluateBalance({ ...setup, payloads: [logger, logger] });
    const fits = twins.flags.filter((f) => f.code === "thread-mismatch");
    expect(fits.map((f) => f.level)).toEqual(["ok"]);
    expect(fits[0].payloads).toEqual([
      { index: 0, name: logger.name },
      { index: 1, name: logger.name },
    ]);

    const { adapter: _none, ...bare } = logger;
    const mismatched = evaluateBalance({ ...setup, payloads: [bare, bare, setup.payloads[0]] });
    expect(flagLevels(mismatched, "thread-mismatch")).toEqual(["stop", "ok"]);
    const stop = mismatched.flags.find((f) => f.code === "thread-mismatch" && f.level === "stop");
    expect(stop?.payloads?.map((p) => p.index)).toEqual([0, 1]);
    expect(stop?.message).toMatch(/\(×2\) have a 3\/8-16 UNC thread/);

    const wrong = { ...logger, adapter: { massKg: 0.01, from: "1/4-20 UNC" as const, to: "1/4-20 UNC" as const } };
    expect(flagLevels(evaluateBalance({ ...setup, payloads: [wrong, wrong] }), "adapter-mismatch")).toEqual(["stop"]);
  });

  it("returns one thread flag per distinct problem when the payloads differ", () => {
    const setup = demoSetup();
    const { adapter: _none, ...bare } = setup.payloads[1];
    const result = evaluateBalance({ ...setup, payloads: [setup.payloads[0], bare, setup.payloads[1]] });
    // direct fit, a mismatch, and a fit through an adapter: three different findings
    expect(flagLevels(result, "thread-mismatch")).toEqual(["ok", "stop", "ok"]);
  });

  it("skips the thread check for a strap", () => {
    const result = evaluateBalance(withPayload({ attachment: "strap" }));
    expect(flagLevels(result, "thread-mismatch")).toEqual([]);
  });

  it("stops above the mount's rated load and cautions above 80 % of it (common practice), with load factor 2", () => {
    // payload 0.2 kg × 2 = 0.4 kg
    expect(flagLevels(evaluateBalance(withPayload({}, { ratedLoadKg: 0.39 })), "mount-rated-load")).toEqual(["stop"]);
    expect(flagLevels(evaluateBalance(withPayload({}, { ratedLoadKg: 0.45 })), "mount-rated-load")).toEqual(["caution"]);
    expect(flagLevels(evaluateBalance(withPayload({}, { ratedLoadKg: 0.6 })), "mount-rated-load")).toEqual(["ok"]);
  });

  it("wants a safety line of 10× the payload weight (common practice) and stops one below the gust load", () => {
    const weightN = 0.2 * 9.80665;
    expect(flagLevels(evaluateBalance(withPayload({}, { safetyLineBreakingLoadN: 10.5 * weightN })), "safety-line")).toEqual(["ok"]);
    expect(flagLevels(evaluateBalance(withPayload({}, { safetyLineBreakingLoadN: 5 * weightN })), "safety-line")).toEqual(["caution"]);
    expect(flagLevels(evaluateBalance(withPayload({}, { safetyLineBreakingLoadN: 1.5 * weightN })), "safety-line")).toEqual(["stop"]);
    const noLine = symmetricSetup();
    expect(flagLevels(evaluateBalance(noLine), "safety-line")).toEqual(["caution"]);
  });

  it("stops a screw loaded beyond its proof load", () => {
    const setup = withPayload({ massKg: 500 }, { ratedLoadKg: 5000 });
    const big: BalanceInput = { ...setup, envelope: { ...setup.envelope, gasVolumeM3: 1000 } };
    const flag = evaluateBalance(big).flags.find((f) => f.code === "thread-capacity");
    expect(flag?.level).toBe("stop");
    expect(flag?.figures.load).toMatchObject({ quantity: "force", unit: "N" });
    expect(flag?.figures.load.value).toBeCloseTo(500 * 9.80665 * 2, 6);
    expect(flag?.figures.load.limit).toBeCloseTo(threadProofLoadN("1/4-20 UNC", ksiToPascals(55)), 6);
  });

  it("flags a mount off the rail as a stop, not a schema error", () => {
    const setup = demoSetup();
    const result = evaluateBalance({ ...setup, mount: { ...setup.mount, positionX: setup.envelope.rail.endX + 0.01 } });
    expect(flagLevels(result, "mount-off-rail")).toEqual(["stop"]);
  });
});
