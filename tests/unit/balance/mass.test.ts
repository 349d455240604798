import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { centreOfMass, evaluateBalance, inchesToMetres, kgToPounds, metresToInches, poundsToKg, type PointMass } from "@/lib/balance";
import { demoSetup } from "./setups";

// FAA Pilot's Handbook of Aeronautical Knowledge (FAA-H-8083-25A, Fig. 9-5; ch. 10 in 25B),
// computational method; line items from memory, totals confirmed (references.md).
const FAA_ITEMS: readonly { item: string; weightLb: number; armIn: number }[] = [
  { item: "empty weight", weightLb: 2100, armIn: 78.3 },
  { item: "front seats", weightLb: 340, armIn: 85 },
  { item: "rear seats", weightLb: 350, armIn: 121 },
  { item: "fuel (75 gal)", weightLb: 450, armIn: 75 },
  { item: "baggage area 1", weightLb: 80, armIn: 150 },
];

describe("centreOfMass", () => {
  it("reproduces the FAA worked weight-and-balance example: 3,320 lb, CG 84.8 in (84.768)", () => {
    const items: PointMass[] = FAA_ITEMS.map(({ weightLb, armIn }) => ({
      massKg: poundsToKg(weightLb),
      x: inchesToMetres(armIn),
      z: 0,
    }));
    const summary = centreOfMass(items);
    const totalMomentLbIn = FAA_ITEMS.reduce((sum, { weightLb, armIn }) => sum + weightLb * armIn, 0);
    expect(totalMomentLbIn).toBeCloseTo(281_430, 6); // FAA: total moment
    expect(kgToPounds(summary.totalMassKg)).toBeCloseTo(3320, 9); // FAA: total weight
    expect(metresToInches(summary.centreOfMass.x)).toBeCloseTo(totalMomentLbIn / 3320, 9);
    expect(metresToInches(summary.centreOfMass.x)).toBeCloseTo(84.768, 3); // FAA: CG
  });

  const pointMass = fc.record({
    massKg: fc.double({ min: 0.001, max: 100, noNaN: true }),
    x: fc.double({ min: -10, max: 10, noNaN: true }),
    z: fc.double({ min: -10, max: 10, noNaN: true }),
  });

  it("does not move when a mass is added at the centre of mass", () => {
    fc.assert(
      fc.property(
        fc.array(pointMass, { minLength: 1, maxLength: 8 }),
        fc.double({ min: 0.001, max: 100, noNaN: true }),
        (items, addedKg) => {
          const before = centreOfMass(items).centreOfMass;
          const after = centreOfMass([...items, { massKg: addedKg, ...before }]).centreOfMass;
          expect(after.x).toBeCloseTo(before.x, 9);
          expect(after.z).toBeCloseTo(before.z, 9);
        },
      ),
    );
  });

  it("never moves forward when the mount slides aft", () => {
    const setup = demoSetup();
    fc.assert(
      fc.property(fc.double({ min: 0.5, max: 1.4, noNaN: true }), fc.double({ min: 0, max: 0.5, noNaN: true }), (positionX, shiftM) => {
        const at = (x: number) => evaluateBalance({ ...setup, mount: { ...setup.mount, positionX: x } });
        expect(at(positionX + shiftM).centreOfMass.x).toBeGreaterThanOrEqual(at(positionX).centreOfMass.x - 1e-12);
      }),
    );
  });

  it("counts envelope, mount, adapters and payloads but not the tether", () => {
    const setup = demoSetup();
    const expectedKg =
      setup.envelope.massKg + setup.mount.massKg + setup.payloads.reduce((sum, p) => sum + p.massKg + (p.adapter?.massKg ?? 0), 0);
    expect(evaluateBalance(setup).totalMassKg).toBeCloseTo(expectedKg, 12);
  });
});
