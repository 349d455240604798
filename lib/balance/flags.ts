/**
 * Flags and the limits that raise them. Every default says where it comes from: design.md's
 * default limits are rules of the trade ("common practice"), strengths cite their standard.
 * A flag is data: its code, level, the figures it speaks of (SI, each with its display quantity)
 * and named parameters; its English message is worded from those by lib/flag-messages.ts, the same
 * words the UI uses in the reader's units, so the two cannot drift apart.
 */
import { flagMessage } from "../flag-messages";
import type { Attachment, LimitsInput, Thread } from "./schema";
import { ksiToPascals } from "./units-si";

import { FLAG_CODES, FLAG_LEVELS, type FlagCode, type FlagLevel } from "../domain/flags";

export { FLAG_CODES, FLAG_LEVELS, type FlagCode, type FlagLevel };

/**
 * The display quantity of a figure (each one lib/units.ts converts for a reader) and the SI unit
 * its value is given in. Angles are in radians and durations in seconds, as SI has them; a ratio
 * is a pure number, whose SI unit is one ("1").
 */
export const FIGURE_SI_UNITS = {
  mass: "kg",
  force: "N",
  length: "m",
  smallLength: "m",
  distance: "m",
  speed: "m/s",
  volume: "m³",
  angle: "rad",
  ratio: "1",
  duration: "s",
} as const;
export type FigureQuantity = keyof typeof FIGURE_SI_UNITS;
export type FigureUnit = (typeof FIGURE_SI_UNITS)[FigureQuantity];

/** One figure a flag speaks of, in SI. */
export interface Figure<Q extends FigureQuantity = FigureQuantity> {
  readonly quantity: Q;
  readonly value: number;
  /** The limit the value is judged against, when the flag states one; same unit as the value. */
  readonly limit?: number;
  readonly unit: (typeof FIGURE_SI_UNITS)[Q];
}

/** A payload a flag is about: its place in the input's list and its name. */
export interface PayloadRef {
  readonly index: number;
  readonly name: string;
}

/** The case a flag speaks of: still air, the steady wind, or the gust. */
export type AirCase = "calm" | "wind" | "gust";

type None = Readonly<Record<string, never>>;

interface WindTrimDetails {
  readonly figures: { readonly speed: Figure<"speed">; readonly trim?: Figure<"angle"> };
  /** `failure` says why there is no trim in this case; without it, `figures.trim` is there. */
  readonly params: { readonly case: "wind" | "gust"; readonly failure?: "cannot-fly" | "no-equilibrium" };
}

interface TetherAngleDetails {
  readonly figures: { readonly speed: Figure<"speed">; readonly angle: Figure<"angle"> };
  readonly params: { readonly case: "wind" | "gust" };
}

/**
 * What each code carries besides its level and message: the figures it speaks of (by name) and
 * its named parameters. Which optional figures are present follows from the level and params;
 * each is documented where lib/flag-messages.ts words it.
 */
export interface FlagDetails {
  readonly "free-lift": {
    /** `ratio` (free lift / gross lift) is there unless the lifter does not fly. */
    readonly figures: { readonly freeLift: Figure<"mass">; readonly ratio?: Figure<"ratio"> };
    readonly params: None;
  };
  readonly "trim-calm": { readonly figures: { readonly trim: Figure<"angle"> }; readonly params: None };
  readonly "trim-unstable": { readonly figures: None; readonly params: None };
  readonly "trim-wind": WindTrimDetails;
  readonly "trim-gust": WindTrimDetails;
  readonly "tether-angle-wind": TetherAngleDetails;
  readonly "tether-angle-gust": TetherAngleDetails;
  readonly "mount-off-rail": {
    readonly figures: {
      /** From the nose; its limit is the rail end it has passed, when it is off the rail. */
      readonly position: Figure<"smallLength">;
      readonly railStart: Figure<"smallLength">;
      readonly railEnd: Figure<"smallLength">;
    };
    readonly params: None;
  };
  readonly "thread-mismatch": {
    readonly figures: None;
    readonly params: { readonly payloadThread: Thread; readonly mountThread: Thread; readonly viaAdapter: boolean };
  };
  readonly "adapter-mismatch": {
    readonly figures: None;
    readonly params: {
      readonly payloadThread: Thread;
      readonly mountThread: Thread;
      readonly adapterFrom: Attachment;
      readonly adapterTo: Thread;
    };
  };
  readonly "mount-rated-load": {
    /** `load`: hanging mass × load factor against the rated load; `share` of the rating at a caution. */
    readonly figures: { readonly load: Figure<"mass">; readonly share?: Figure<"ratio"> };
    readonly params: { readonly loadFactor: number };
  };
  readonly "thread-capacity": {
    /** The most loaded screw's gust load against its proof load. */
    readonly figures: { readonly load: Figure<"force"> };
    readonly params: { readonly loadFactor: number; readonly screw: "mount" | "payload" | "adapter"; readonly thread: Thread };
  };
  readonly "safety-line": {
    /**
     * `breakingLoad` against the gust load (stop) or the advised strength (caution, ok);
     * `needed` alone when no line is given.
     */
    readonly figures: { readonly breakingLoad?: Figure<"force">; readonly needed?: Figure<"force"> };
    readonly params: { readonly loadFactor: number; readonly safetyLineFactor: number };
  };
  readonly "clearance-hull": {
    /** Negative when the payload cuts into the hull. */
    readonly figures: { readonly gap: Figure<"smallLength"> };
    readonly params: None;
  };
  readonly "clearance-tether": {
    /** `speed` is the wind the line's angle is taken at; absent in calm air. */
    readonly figures: { readonly gap: Figure<"smallLength">; readonly speed?: Figure<"speed"> };
    readonly params: None;
  };
  readonly "tether-length": {
    /**
     * `lineOut` against the most line the free lift holds up; at a stop also the line's mass and
     * the free lift, at a caution the free lift left with the line out.
     */
    readonly figures: {
      readonly lineOut: Figure<"distance">;
      readonly lineMass?: Figure<"mass">;
      readonly freeLift?: Figure<"mass">;
      readonly freeLiftLeft?: Figure<"ratio">;
    };
    readonly params: None;
  };
  readonly "tether-strength": {
    /** `tension` (the largest, in `params.case`) against the breaking load or breaking load / factor. */
    readonly figures: { readonly tension: Figure<"force">; readonly breakingLoad: Figure<"force"> };
    readonly params: { readonly safetyFactor: number; readonly case: AirCase };
  };
  readonly "helium-top-up": {
    readonly figures: {
      readonly topUpAfter: Figure<"duration">;
      readonly lossPerDay: Figure<"ratio">;
      /** Today's free-lift ratio and the caution limit it falls to. */
      readonly freeLiftRatio: Figure<"ratio">;
    };
    readonly params: None;
  };
  readonly "moored-balloon-rules": {
    /** Against the 14 CFR 101.1(a)(1) thresholds; `diameter` when the hull's shape is known. */
    readonly figures: { readonly gasVolume: Figure<"volume">; readonly diameter?: Figure<"length"> };
    readonly params: None;
  };
  readonly "tether-height": {
    /** The line out against the US notice height and the UK permission height. */
    readonly figures: { readonly usNotice: Figure<"distance">; readonly ukPermission: Figure<"distance"> };
    readonly params: None;
  };
}

interface FlagBase<C extends FlagCode> {
  readonly code: C;
  readonly level: FlagLevel;
  readonly figures: FlagDetails[C]["figures"];
  readonly params: FlagDetails[C]["params"];
  /** The payloads the flag is about, in input order, when it is about some. */
  readonly payloads?: readonly PayloadRef[];
  /**
   * The first of `payloads`.
   * @deprecated read `payloads`: one flag may be about several identical payloads.
   */
  readonly payloadIndex?: number;
}

/** A flag before it is worded: everything lib/flag-messages.ts needs. */
export type FlagData<C extends FlagCode = FlagCode> = { readonly [K in C]: FlagBase<K> }[C];

/** A flag as the engine returns it: its data and its plain English message in metric units. */
export type Flag<C extends FlagCode = FlagCode> = {
  readonly [K in C]: FlagBase<K> & {
    /** Plain English with metric (SI) figures: the API's and the CLI's wording of the flag. */
    readonly message: string;
  };
}[C];

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

/** A flag with its message worded in metric by the same words the UI uses (lib/flag-messages.ts). */
export function makeFlag<C extends FlagCode>(code: C, level: FlagLevel, input: FlagInput<C>): Flag<C> {
  // Built once and in this key order, so the JSON reads code, level, message, then the data.
  const flag: { -readonly [K in keyof FlagBase<C>]: FlagBase<C>[K] } & { message: string } = {
    code, level, message: "", figures: input.figures, params: input.params,
  };
  if (input.payloads && input.payloads.length > 0) {
    flag.payloads = input.payloads;
    flag.payloadIndex = input.payloads[0].index;
  }
  flag.message = flagMessage(flag as unknown as FlagData, "metric");
  return flag as unknown as Flag<C>;
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
