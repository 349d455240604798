import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { evaluateBalance, solveLevelTrimPositionX, solveMaxPayloadMassKg, type BalanceInput } from "@/lib/balance";
import { demoSetup, symmetricSetup } from "./setups";

/** Calm trim with the mount at x, by the full engine. */
const calmTrimAt = (input: BalanceInput, positionX: number): number | null =>
  evaluateBalance({ ...input, mount: { ...input.mount, positionX } }).calmTrimDeg;

describe("solveLevelTrimPositionX", () => {
  it("returns a position whose calm trim is level within 1e-6° for any demo-like loading", () => {
    fc.assert(
      fc.property(
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
          expect(solution.reason).toBeNull();
          if (solution.positionX === null) return; // unreachable after the line above; narrows the type
          expect(Math.abs(solution.trimDeg)).toBeLessThan(1e-6);
          const trim = calmTrimAt(input, solution.positionX);
          expect(trim).not.toBeNull();
          expect(Math.abs(trim!)).toBeLessThan(1e-6);
        },
      ),
    );
  });

  it("returns the target trim on the rail for 5° and off the rail for 80°, and says which", () => {
    const setup = demoSetup();
    const rail = setup.envelope.rail;
    const five = solveLevelTrimPositionX(setup, 5);
    expect(five.reason).toBeNull();
    expect(five.withinRail).toBe(true);
    expect(five.positionX).toBeGreaterThanOrEqual(rail.startX);
    expect(five.positionX).toBeLessThanOrEqual(rail.endX);
    expect(five.trimDeg).toBeCloseTo(5, 6);
    expect(calmTrimAt(setup, five.positionX!)).toBeCloseTo(5, 6);

    const eighty = solveLevelTrimPositionX(setup, 80);
    expect(eighty.reason).toBeNull();
    expect(eighty.withinRail).toBe(false);
    expect(eighty.positionX! < rail.startX || eighty.positionX! > rail.endX).toBe(true);
    expect(eighty.trimDeg).toBeCloseTo(80, 6);
    expect(calmTrimAt(setup, eighty.positionX!)).toBeCloseTo(80, 6);
  });

  it("returns no position, and why, when nothing moves with the mount, there is no free lift or no stable trim", () => {
    const setup = symmetricSetup();
    const bare = { ...setup, mount: { ...setup.mount, massKg: 0 }, payloads: [] };
    // it flies and trims, so the only thing missing is mass that moves with the mount
    expect(evaluateBalance(bare).calmTrimDeg).not.toBeNull();
    expect(solveLevelTrimPositionX(bare)).toMatchObject({ positionX: null, reason: "nothing-moves" });

    const heavy = { ...setup, payloads: [{ ...setup.payloads[0], massKg: 2 }] };
    expect(evaluateBalance(heavy).freeLiftKg).toBeLessThan(0);
    expect(solveLevelTrimPositionX(heavy)).toMatchObject({ positionX: null, reason: "no-free-lift" });

    const topHeavy = { ...setup, envelope: { ...setup.envelope, tetherPoint: { x: 1, z: 1 } } };
    expect(evaluateBalance(topHeavy).freeLiftKg).toBeGreaterThan(0);
    expect(solveLevelTrimPositionX(topHeavy)).toMatchObject({ positionX: null, reason: "unstable" });
  });
});

describe("solveMaxPayloadMassKg", () => {
  it("returns the largest extra mass with no stop flag: 1 g more brings one", () => {
    // The demo's whip touches the tether at 4 m/s; hung under the mount it is clear.
    const demo = demoSetup();
    const setup: BalanceInput = {
      ...demo,
      payloads: [{ ...demo.payloads[0], offset: { ...demo.payloads[0].offset, x: 0 } }, demo.payloads[1]],
    };
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
    // With 10 m of line out the demo still flies at 3000 m, so both answers are masses to compare.
    const demo = demoSetup();
    const setup: BalanceInput = { ...demo, tether: { ...demo.tether!, lengthOutM: 10 } };
    const low = solveMaxPayloadMassKg({ ...setup, site: { altitudeM: 0 } }, { payloadIndex: 1, retrim: true });
    const high = solveMaxPayloadMassKg({ ...setup, site: { altitudeM: 3000 } }, { payloadIndex: 1, retrim: true });
    expect(low.extraMassKg).not.toBeNull();
    expect(high.extraMassKg).not.toBeNull();
    expect(high.extraMassKg!).toBeGreaterThan(0);
    expect(low.extraMassKg!).toBeGreaterThan(high.extraMassKg!);
  });

  it("returns null when the setup already has a stop", () => {
    const setup = demoSetup();
    const solution = solveMaxPayloadMassKg({ ...setup, mount: { ...setup.mount, positionX: 5 } });
    expect(solution.extraMassKg).toBeNull();
    expect(solution.limitingCode).toBe("mount-off-rail");
  });
});
