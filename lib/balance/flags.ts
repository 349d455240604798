/**
 * Flags and the limits that raise them. Every default says where it comes from: design.md's
 * default limits are rules of the trade ("common practice"), strengths cite their standard.
 */
import type { LimitsInput } from "./schema";
import { ksiToPascals } from "./units-si";

import { FLAG_CODES, FLAG_LEVELS, type FlagCode, type FlagLevel } from "../domain/flags";

export { FLAG_CODES, FLAG_LEVELS, type FlagCode, type FlagLevel };

export interface Flag {
  readonly code: FlagCode;
  readonly level: FlagLevel;
  /** Plain words with the value and the limit, SI units. */
  readonly message: string;
  readonly valueSI?: number;
  readonly limitSI?: number;
  /** The payload the flag is about, when it is about one. */
  readonly payloadIndex?: number;
}

export interface Limits {
  readonly cautionFreeLiftRatio: number;
  readonly cautionTrimDeg: number;
  readonly stopTrimDeg: number;
  readonly cautionTetherAngleDeg: number;
  readonly stopTetherAngleDeg: number;
  readonly loadFactor: number;
  readonly mountCautionFraction: number;
  readonly safetyLineFactor: number;
  readonly tetherSafetyFactor: number;
  readonly clearanceCautionM: number;
  readonly screwProofStrengthPa: number;
}

export const DEFAULT_LIMITS: Limits = {
  // Common practice (design.md): no published free-lift fraction for tethered balloons.
  cautionFreeLiftRatio: 0.15,
  // Common practice (design.md): calm trim beyond ±10° means the mount is far from its place.
  cautionTrimDeg: 10,
  // Common practice: beyond ±30° the sail stalls or dives.
  stopTrimDeg: 30,
  // Common practice (design.md): beyond 45° from vertical the lifter is being blown down.
  cautionTetherAngleDeg: 45,
  // Common practice: beyond 70° it is close to the ground in that wind.
  stopTetherAngleDeg: 70,
  // Common practice: gusts and handling jerk a hanging payload to about twice its weight.
  loadFactor: 2,
  // Common practice: keep a mount below 80 % of its rated load.
  mountCautionFraction: 0.8,
  // Common practice (references.md): safety line at least 10× the payload's weight.
  safetyLineFactor: 10,
  // Common practice: the tether's breaking load at least 5× the largest tension.
  tetherSafetyFactor: 5,
  // Common practice: 2 cm of room for fabric bulge and sway.
  clearanceCautionM: 0.02,
  // SAE J429 grade 2 (1/4–3/4 in): proof strength 55 ksi.
  screwProofStrengthPa: ksiToPascals(55),
};

export function resolveLimits(limits: Readonly<LimitsInput> | undefined): Limits {
  if (!limits) return DEFAULT_LIMITS;
  return {
    cautionFreeLiftRatio: limits.cautionFreeLiftRatio ?? DEFAULT_LIMITS.cautionFreeLiftRatio,
    cautionTrimDeg: limits.cautionTrimDeg ?? DEFAULT_LIMITS.cautionTrimDeg,
    stopTrimDeg: limits.stopTrimDeg ?? DEFAULT_LIMITS.stopTrimDeg,
    cautionTetherAngleDeg: limits.cautionTetherAngleDeg ?? DEFAULT_LIMITS.cautionTetherAngleDeg,
    stopTetherAngleDeg: limits.stopTetherAngleDeg ?? DEFAULT_LIMITS.stopTetherAngleDeg,
    loadFactor: limits.loadFactor ?? DEFAULT_LIMITS.loadFactor,
    mountCautionFraction: limits.mountCautionFraction ?? DEFAULT_LIMITS.mountCautionFraction,
    safetyLineFactor: limits.safetyLineFactor ?? DEFAULT_LIMITS.safetyLineFactor,
    tetherSafetyFactor: limits.tetherSafetyFactor ?? DEFAULT_LIMITS.tetherSafetyFactor,
    clearanceCautionM: limits.clearanceCautionM ?? DEFAULT_LIMITS.clearanceCautionM,
    screwProofStrengthPa: limits.screwProofStrengthPa ?? DEFAULT_LIMITS.screwProofStrengthPa,
  };
}

export function makeFlag(
  code: FlagCode,
  level: FlagLevel,
  message: string,
  valueSI?: number,
  limitSI?: number,
  payloadIndex?: number,
): Flag {
  const flag: { -readonly [K in keyof Flag]: Flag[K] } = { code, level, message };
  if (valueSI !== undefined) flag.valueSI = valueSI;
  if (limitSI !== undefined) flag.limitSI = limitSI;
  if (payloadIndex !== undefined) flag.payloadIndex = payloadIndex;
  return flag;
}

export function worstLevel(flags: readonly Flag[]): FlagLevel {
  let worst: FlagLevel = "ok";
  for (const flag of flags) {
    if (flag.level === "stop") return "stop";
    if (flag.level === "caution") worst = "caution";
  }
  return worst;
}

// Message formatting: short, fixed decimals, SI units.
export const percent = (fraction: number): string => `${(fraction * 100).toFixed(1)} %`;
export const fixed = (value: number, digits: number): string => value.toFixed(digits);
