import { calibrationFactor } from "@/lib/balance";

// A serial unit's calibration from its lift tests: the latest test (by its date, then by when it
// was recorded) against the model's drawn volume. Pure, for the server's queries and the Workshop.

export interface LiftTestFacts {
  measuredGrossLiftKg: number;
  temperatureC: number;
  /** Null: ISA pressure at the altitude. */
  pressurePa: number | null;
  altitudeM: number;
  purity: number;
  testedOn: string;
  createdAt: Date | string;
}

const recordedAt = (test: LiftTestFacts): number => new Date(test.createdAt).getTime();

/** The test the unit plans with: the latest by date, and of one day the one recorded last. */
export function latestLiftTest<T extends LiftTestFacts>(tests: readonly T[]): T | null {
  let latest: T | null = null;
  for (const test of tests) {
    if (!latest || test.testedOn > latest.testedOn || (test.testedOn === latest.testedOn && recordedAt(test) > recordedAt(latest)))
      latest = test;
  }
  return latest;
}

/** Measured ÷ predicted gross lift of the model at the test; null when the unit has no usable test. */
export function unitCalibrationFactor(modelGasVolumeM3: number, test: LiftTestFacts | null): number | null {
  if (!test) return null;
  const factor = calibrationFactor(modelGasVolumeM3, {
    measuredGrossLiftKg: test.measuredGrossLiftKg,
    temperatureC: test.temperatureC,
    altitudeM: test.altitudeM,
    ...(test.pressurePa === null ? {} : { pressurePa: test.pressurePa }),
    purity: test.purity,
  });
  return Number.isFinite(factor) && factor > 0 ? factor : null;
}
