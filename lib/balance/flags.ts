/**
 * Flags and the limits that raise them. Every default says where it comes from: design.md's
 * default limits are rules of the trade ("common practice"), strengths cite their standard.
 * A flag is data: its code, level, the figures it speaks of (SI, each with its display quantity)
 * and named parameters; its English message is worded from those by lib/flag-messages.ts, the same
 * words the UI uses in the reader's units, so the two cannot drift apart.
 */
import { flagMessage } from "../flag-messages";
import type { FlagCode, FlagLevel } from "../domain/flags";
import {
  FIGURE_SI_UNITS,
  type FigureQuantity,
  type Figure,
  type Flag,
  type FlagData,
  type FlagDetails,
  type PayloadRef,
} from "./flag-shape";
import type { LimitsInput } from "./schema";
import { ksiToPascals } from "./units-si";

export { FLAG_CODES, FLAG_LEVELS, type FlagCode, type FlagLevel } from "../domain/flags";
export * from "./flag-shape";

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

export interface FlagInput<C extends FlagCode> {
  readonly figures: FlagDetails[C]["figures"];
  readonly params: FlagDetails[C]["params"];
  readonly payloads?: readonly PayloadRef[];
}

/**
 * A flag as the engine makes it. Its message is worded in metric by the same words the UI uses
 * (lib/flag-messages.ts) when it is read, not when the flag is made: the Planner evaluates on
 * every drag and words flags itself in the reader's units, while the API, the CLI and the stored
 * result read it as they serialise (toJSON puts it in, in the order code, level, message, data).
 * Send flags across a boundary as JSON (as Response.json and the database do), not by
 * structured cloning, which keeps no getters.
 */
class EngineFlag {
  readonly code: FlagCode;
  readonly level: FlagLevel;
  readonly figures: unknown;
  readonly params: unknown;
  readonly payloads: readonly PayloadRef[] | undefined;

  constructor(code: FlagCode, level: FlagLevel, figures: unknown, params: unknown, payloads: readonly PayloadRef[] | undefined) {
    this.code = code;
    this.level = level;
    this.figures = figures;
    this.params = params;
    const some = payloads !== undefined && payloads.length > 0;
    this.payloads = some ? payloads : undefined;
  }

  get message(): string {
    return flagMessage(this as unknown as FlagData, "metric");
  }

  toJSON(): Record<string, unknown> {
    const { code, level, message, figures, params, payloads } = this;
    return payloads ? { code, level, message, figures, params, payloads } : { code, level, message, figures, params };
  }
}

export function makeFlag<C extends FlagCode>(code: C, level: FlagLevel, input: FlagInput<C>): Flag<C> {
  return new EngineFlag(code, level, input.figures, input.params, input.payloads) as unknown as Flag<C>;
}

/**
 * Collects one finding per distinct key with every payload it applies to, in first-seen order:
 * two identical payloads make one flag that names both, not two flags that say the same.
 */
export function findingsByPayload<F>(): {
  add(key: string, payload: PayloadRef, finding: F): void;
  groups(): ReadonlyArray<{ readonly finding: F; readonly payloads: readonly PayloadRef[] }>;
} {
  const byKey = new Map<string, { finding: F; payloads: PayloadRef[] }>();
  return {
    add(key, payload, finding) {
      const group = byKey.get(key);
      if (group) group.payloads.push(payload);
      else byKey.set(key, { finding, payloads: [payload] });
    },
    groups: () => [...byKey.values()],
  };
}

/** A figure in SI: its unit follows from its quantity. */
export function figure<Q extends FigureQuantity>(quantity: Q, value: number, limit?: number): Figure<Q> {
  const unit = FIGURE_SI_UNITS[quantity];
  return limit === undefined ? { quantity, value, unit } : { quantity, value, limit, unit };
}

export function worstLevel(flags: readonly Flag[]): FlagLevel {
  let worst: FlagLevel = "ok";
  for (const flag of flags) {
    if (flag.level === "stop") return "stop";
    if (flag.level === "caution") worst = "caution";
  }
  return worst;
}
