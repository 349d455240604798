import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  CALIBRATION_FACTOR_RANGE,
  calibrationFactor,
  calibrationOutOfRange,
  dayLiftCheck,
  evaluateBalance,
  gasVolumeFromLiftMeasurementM3,
  predictedGrossLiftKg,
} from "@/lib/balance";
import { demoSetup as demoInput } from "./setups";

// Worked by hand from the ideal-gas relations, at ISA sea level (ISO 2533: 101 325 Pa, 288.15 K):
//   ρ_air = 101 325 / (287.05287 × 288.15)            = 1.225000 kg/m³ (ISO 2533's tabulated value)
//   ρ_He  = ρ_air × M_He / M_air = 1.225 × 4.002602 / 28.9644 = 0.169283 kg/m³
//   net lift of pure helium                          = 1.055717 kg per m³
const SEA_LEVEL = { temperatureC: 15, pressurePa: 101_325 } as const;
const RHO_AIR = 1.225;
const RHO_HE = (1.225 * 4.002602) / 28.9644;
const NET_PURE = RHO_AIR - RHO_HE; // 1.055717

// The field weighing of the worked example: a 1.1 m³ envelope with 0.60 kg hanging on it (envelope
// 0.47 kg, mount 0.045 kg, whip 0.085 kg) pulls up 0.40 kg: gross lift 1.00 kg, i.e. 0.909091 kg
// per m³; purity = 0.909091 / 1.055717 = 0.86111.
const WORKED = { freeLiftKg: 0.4, weighedMassKg: 0.6, gasVolumeM3: 1.1, ...SEA_LEVEL, purity: 1 } as const;

describe("predictedGrossLiftKg", () => {
  it("returns volume × (ρ_air − ρ_He) for pure helium at sea level", () => {
    expect(predictedGrossLiftKg(1.1, SEA_LEVEL)).toBeCloseTo(1.1 * NET_PURE, 5); // 1.161289 kg
  });

  it("returns purity × the pure-helium lift when the rest is air at the same temperature", () => {
    expect(predictedGrossLiftKg(1.1, { ...SEA_LEVEL, purity: 0.95 })).toBeCloseTo(0.95 * 1.1 * NET_PURE, 5);
  });
});

describe("calibrationFactor", () => {
  it("returns measured ÷ predicted gross lift for the model at the test's air", () => {
    // 1.13 kg measured against 1.161289 kg predicted: 0.973057 (worked by hand).
    expect(calibrationFactor(1.1, { measuredGrossLiftKg: 1.13, ...SEA_LEVEL })).toBeCloseTo(0.973057, 5);
  });

  it("returns a factor that, times the model's volume, is the volume the weighing implies", () => {
    const test = { measuredGrossLiftKg: 1.13, temperatureC: 18, altitudeM: 40 };
    const factor = calibrationFactor(1.1, test);
    expect(1.1 * factor).toBeCloseTo(gasVolumeFromLiftMeasurementM3({ grossLiftKg: 1.13, temperatureC: 18, altitudeM: 40 }), 10);
  });

  it("returns a larger factor for the same lift weighed with impure gas", () => {
    const pure = calibrationFactor(1.1, { measuredGrossLiftKg: 1.1, ...SEA_LEVEL });
    const impure = calibrationFactor(1.1, { measuredGrossLiftKg: 1.1, ...SEA_LEVEL, purity: 0.9 });
    expect(impure).toBeCloseTo(pure / 0.9, 8);
  });

  it("uses a measured pressure in place of ISA at the altitude", () => {
    const byPressure = calibrationFactor(1.1, { measuredGrossLiftKg: 1.13, temperatureC: 15, altitudeM: 2000, pressurePa: 101_325 });
    expect(byPressure).toBeCloseTo(0.973057, 5);
  });
});

describe("calibrationOutOfRange", () => {
  it("returns true outside 0.85–1.15 and false inside (common practice)", () => {
    expect(CALIBRATION_FACTOR_RANGE).toEqual({ min: 0.85, max: 1.15 });
    expect(calibrationOutOfRange(0.84)).toBe(true);
    expect(calibrationOutOfRange(0.85)).toBe(false);
    expect(calibrationOutOfRange(1)).toBe(false);
    expect(calibrationOutOfRange(1.15)).toBe(false);
    expect(calibrationOutOfRange(1.16)).toBe(true);
    expect(calibrationOutOfRange(Number.NaN)).toBe(true);
  });
});

describe("dayLiftCheck", () => {
  it("returns the worked example's purity 0.86111 when solving for purity", () => {
    const check = dayLiftCheck({ ...WORKED, solveFor: "purity" });
    expect(check.grossLiftKg).toBeCloseTo(1.0, 12);
    expect(check.purity).toBeCloseTo(1.0 / 1.1 / NET_PURE, 6);
    expect(check.purity).toBeCloseTo(0.86111, 4);
    expect(check.gasVolumeM3).toBe(1.1);
    expect(check.problem).toBeNull();
  });

  it("returns the purity with superheat from air and helium at the gas temperature (worked: 0.85592)", () => {
    // T_gas = 293.15 K: ρ_air,gas = 1.225·288.15/293.15 = 1.204106, ρ_He,gas = 0.166396;
    // P = (0.909091 − (1.225 − 1.204106)) / (1.204106 − 0.166396) = 0.85592.
    const check = dayLiftCheck({ ...WORKED, superheatK: 5, solveFor: "purity" });
    expect(check.purity).toBeCloseTo(0.85592, 4);
  });

  it("returns the worked example's volume 0.94722 m³ when solving for volume with pure helium", () => {
    const check = dayLiftCheck({ ...WORKED, solveFor: "volume" });
    expect(check.gasVolumeM3).toBeCloseTo(1.0 / NET_PURE, 6); // 0.947222 m³
    expect(check.purity).toBe(1);
    expect(check.problem).toBeNull();
  });

  it("reports more lift than pure helium could give in the planned volume", () => {
    const check = dayLiftCheck({ ...WORKED, freeLiftKg: 0.7, solveFor: "purity" });
    expect(check.purity).toBeGreaterThan(1);
    expect(check.problem).toBe("above-pure-helium");
  });

  it("reports no gross lift when the scale shows the lifter heavier than its load", () => {
    expect(dayLiftCheck({ ...WORKED, freeLiftKg: -0.7, solveFor: "purity" }).problem).toBe("no-gross-lift");
  });

  it("returns a check that makes the engine's free lift equal the weighed free lift (property)", () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.05, max: 0.5, noNaN: true }),
        fc.double({ min: -10, max: 35, noNaN: true }),
        fc.constantFrom<"purity" | "volume">("purity", "volume"),
        (freeLiftKg, temperatureC, solveFor) => {
          const input = demoInput();
          const base = evaluateBalance({ ...input, site: { ...input.site, temperatureC } });
          const check = dayLiftCheck({
            freeLiftKg,
            weighedMassKg: base.totalMassKg,
            temperatureC,
            altitudeM: input.site?.altitudeM ?? 0,
            pressurePa: input.site?.pressurePa,
            superheatK: input.gas?.superheatK,
            fillFraction: input.gas?.fillFraction,
            gasVolumeM3: input.envelope.gasVolumeM3,
            purity: input.gas?.purity ?? 1,
            solveFor,
          });
          const applied = evaluateBalance({
            ...input,
            envelope: { ...input.envelope, gasVolumeM3: check.gasVolumeM3 },
            gas: { ...input.gas, purity: check.purity },
            site: { ...input.site, temperatureC },
          });
          expect(applied.freeLiftKg).toBeCloseTo(freeLiftKg, 9);
        },
      ),
      { numRuns: 60 },
    );
  });
});
