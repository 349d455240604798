import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { evaluateBalance, solveLevelTrimPositionX, solveMaxPayloadMassKg, type BalanceInput } from "@/lib/balance";
import { demoSetup } from "./setups";

describe("solveLevelTrimPositionX", () => {
  it("finds a rail position whose calm trim is within 0.1° of level", () => {
    fc.assert(fc.property(
      fc.double({ min: 0.65, max: 1.25, noNaN: true }),
      fc.double({ min: 0.02, max: 0.25, noNaN: true }),
      fc.double({ min: -0.1, max: 0.1, noNaN: true }),
      (positionX, whipKg, whipOffsetX) => {
        const setup = demoSetup();
        const input: BalanceInput = {
          ...setup,
          mount: { ...setup.mount, positionX },
          payloads: [{ ...setup.payloads[0], massKg: whipKg, offset: { x: whipOffsetX, z: -0.3 } }, setup.payloads[1]],
        };
        const solution = solveLevelTrimPositionX(input);
        expect(solution).not.toBeNull();
        const result = evaluateBalance({ ...input, mount: { ...input.mount, positionX: solution!.positionX } });
        expect(Math.abs(result.calmTrimDeg ?? 90)).toBeLessThan(0.1);
      },
    ));
  });

  it("reaches a target trim and says whether it is on the rail", () => {
    const setup = demoSetup();
    const solution = solveLevelTrimPositionX(setup, 5);
    expect(solution?.trimDeg).toBeCloseTo(5, 6);
    expect(solution?.withinRail).toBe(true);
    const offRail = solveLevelTrimPositionX(setup, 80);
    expect(offRail?.withinRail ?? false).toBe(false);
  });

  it("returns null when nothing moves with the mount", () => {
    const setup = demoSetup();
    expect(solveLevelTrimPositionX({ ...setup, mount: { ...setup.mount, massKg: 0 }, payloads: [] })).toBeNull();
  });
});

describe("solveMaxPayloadMassKg", () => {
  it("returns the largest extra mass with no stop flag: 1 g more brings one", () => {
    const setup = demoSetup();
    const solution = solveMaxPayloadMassKg(setup);
    expect(solution.extraMassKg).not.toBeNull();
    const extra = solution.extraMassKg!;
    const withExtra = (kg: number): BalanceInput => ({
      ...setup,
      payloads: [...setup.payloads, { name: "extra", massKg: kg, offset: { x: 0, z: 0 }, attachment: "1/4-20 UNC" }],
    });
    expect(evaluateBalance(withExtra(extra)).flags.some((f) => f.level === "stop")).toBe(false);
    expect(evaluateBalance(withExtra(extra + 0.001)).flags.some((f) => f.level === "stop")).toBe(true);
    expect(extra).toBeLessThan(evaluateBalance(setup).freeLiftKg);
    expect(solution.limitingCode).not.toBeNull();
  });

  it("carries more at sea level than at 3000 m", () => {
    const setup = demoSetup();
    const low = solveMaxPayloadMassKg({ ...setup, site: { altitudeM: 0 } }, { payloadIndex: 1, retrim: true });
    const high = solveMaxPayloadMassKg({ ...setup, site: { altitudeM: 3000 } }, { payloadIndex: 1, retrim: true });
    expect(low.extraMassKg!).toBeGreaterThan(high.extraMassKg ?? 0);
  });

  it("returns null when the setup already has a stop", () => {
    const setup = demoSetup();
    const solution = solveMaxPayloadMassKg({ ...setup, mount: { ...setup.mount, positionX: 5 } });
    expect(solution.extraMassKg).toBeNull();
    expect(solution.limitingCode).toBe("mount-off-rail");
  });
});
