import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { THREADS, balanceInputSchema, demoHulls, evaluateBalance, tetherLinePoints, type BalanceInput } from "@/lib/balance";
import { flagMessage } from "@/lib/flag-messages";
import { allNumbers } from "./setups";

// Whole schema ranges, edges included: fast-check's doubles favour bounds and small values.
const num = (min: number, max: number) => fc.double({ min, max, noNaN: true, noDefaultInfinity: true });
const opt = <T>(arbitrary: fc.Arbitrary<T>) => fc.option(arbitrary, { nil: undefined });
const point = fc.record({ x: num(-1000, 1000), z: num(-1000, 1000) });
const nearPoint = fc.record({ x: num(-3, 3), z: num(-3, 3) });
const anyPoint = fc.oneof(nearPoint, point);
const thread = fc.constantFrom(...THREADS);

const randomHull = fc.record({
  lengthM: num(0.1, 50),
  maxDiameterM: num(0.02, 20),
  maxDiameterAtFraction: num(0.15, 0.85),
  noseShape: opt(num(0.3, 0.7)),
  tailShape: opt(num(0.5, 2)),
  fins: opt(
    fc
      .record({
        count: fc.integer({ min: 0, max: 8 }),
        rootChordM: num(0, 50),
        tipFraction: num(0, 1),
        spanM: num(0, 20),
        trailingEdgeFraction: num(0.3, 1),
        firstAngleDeg: opt(num(-360, 360)),
      })
      .map(({ tipFraction, ...fins }) => ({ ...fins, tipChordM: fins.rootChordM * tipFraction })),
  ),
  fabricArealDensityKgM2: opt(num(0, 5)),
});

const validInput: fc.Arbitrary<BalanceInput> = fc.record({
  envelope: fc.record({
    gasVolumeM3: fc.oneof(num(1e-6, 5), num(1e-300, 100_000)),
    massKg: fc.oneof(num(0, 2), num(0, 100_000)),
    buoyancyCentre: anyPoint,
    massCentre: anyPoint,
    tetherPoint: anyPoint,
    rail: fc
      .tuple(num(-1000, 1000), num(0, 2000), num(-1000, 1000))
      .map(([startX, length, z]) => ({ startX, endX: Math.min(1000, startX + length), z })),
    aero: opt(
      fc.record({
        sailAreaM2: num(0, 10_000),
        liftSlopePerRad: num(0, 10),
        zeroLiftTrimDeg: num(-45, 45),
        dragCoefficient: num(0, 5),
        pressureCentre: anyPoint,
        aspectRatio: opt(num(1e-6, 100)),
        spanEfficiency: opt(num(1e-6, 1)),
      }),
    ),
    limits: opt(
      fc.record({
        cautionFreeLiftRatio: opt(num(0, 1)),
        cautionTrimDeg: opt(num(0, 90)),
        stopTrimDeg: opt(num(0, 90)),
        cautionTetherAngleDeg: opt(num(0, 90)),
        stopTetherAngleDeg: opt(num(0, 90)),
        loadFactor: opt(num(1, 100)),
        mountCautionFraction: opt(num(0, 1)),
        safetyLineFactor: opt(num(1, 1000)),
        tetherSafetyFactor: opt(num(1, 1000)),
        clearanceCautionM: opt(num(0, 10)),
        screwProofStrengthPa: opt(num(1e-6, 5e9)),
      }),
    ),
    hull: opt(fc.oneof(fc.constantFrom(...Object.values(demoHulls)), randomHull)),
    permeabilityLPerM2DayAtm: opt(num(0, 1000)),
    surfaceAreaM2: opt(num(1e-6, 1e6)),
  }),
  gas: opt(
    fc.record({
      purity: opt(num(0, 1)),
      superheatK: opt(num(-30, 80)),
      fillFraction: opt(num(1e-9, 1)),
      cylinderContentM3: opt(num(1e-6, 1000)),
      lossPerDayFraction: opt(num(0, 0.99)),
    }),
  ),
  site: opt(
    fc.record({
      altitudeM: opt(num(-500, 11_000)),
      temperatureC: opt(num(-80, 60)),
      pressurePa: opt(num(10_000, 120_000)),
      windMS: opt(num(0, 60)),
      gustMS: opt(num(0, 80)),
      windMeasuredAtM: opt(num(1e-6, 1000)),
      windShearExponent: opt(num(0, 1)),
      relativeHumidity: opt(num(0, 1)),
    }),
  ),
  mount: fc.record({
    positionX: num(-1000, 1000),
    massKg: num(0, 10_000),
    thread,
    ratedLoadKg: num(0, 100_000),
    safetyLineBreakingLoadN: opt(num(0, 1e7)),
  }),
  payloads: fc.array(
    fc.record({
      name: fc.constantFrom("whip", "logger", "camera", "strobe"),
      massKg: fc.oneof(num(0, 1), num(0, 10_000)),
      offset: anyPoint,
      attachment: fc.constantFrom(...THREADS, "strap" as const),
      adapter: opt(fc.record({ massKg: num(0, 1000), from: thread, to: thread })),
      size: opt(fc.record({ lengthM: num(0, 100), widthM: num(0, 100), heightM: num(0, 100) })),
      dragAreaM2: opt(num(0, 1000)),
    }),
    { maxLength: 5 },
  ),
  tether: opt(
    fc.record({
      massPerMetreKg: fc.oneof(num(0.0005, 0.05), num(1e-9, 100)),
      lengthOutM: fc.oneof(num(0, 300), num(0, 100_000)),
      breakingLoadN: num(1e-6, 1e9),
      diameterM: opt(num(1e-9, 0.1)),
      normalDragCoefficient: opt(num(0, 5)),
      skinFrictionCoefficient: opt(num(0, 1)),
    }),
  ),
});

describe("evaluateBalance on random valid input", () => {
  it("never throws and returns only finite numbers for 10,000 inputs", () => {
    fc.assert(
      fc.property(validInput, (input) => {
        expect(balanceInputSchema.safeParse(input).success).toBe(true);
        const frozen = structuredClone(input);
        const result = evaluateBalance(input);
        const bad = allNumbers(result).filter(([, value]) => !Number.isFinite(value));
        expect(bad).toEqual([]);
        expect(input).toEqual(frozen); // inputs are never mutated
        const points = tetherLinePoints(input, result, "wind");
        expect(points.filter((p) => !Number.isFinite(p.x) || !Number.isFinite(p.z))).toEqual([]);
        for (const flag of result.flags) {
          expect(flag.message).not.toMatch(/NaN|Infinity/);
          expect(flagMessage(flag, "imperial")).not.toMatch(/NaN|Infinity/);
        }
      }),
      { numRuns: 10_000 },
    );
  }, 120_000);
});
