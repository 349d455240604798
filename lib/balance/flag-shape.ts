/**
 * The shape of a flag: its code, level, the figures it speaks of and its named parameters. Types
 * only (and the SI unit of each figure quantity), so that the wording in lib/flag-messages.ts and
 * the engine's builders in ./flags.ts share them without importing each other's code.
 */
import type { FlagCode, FlagLevel } from "../domain/flags";
import type { LossSource } from "./helium";
import type { Attachment, Thread } from "./schema";

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
  /**
   * `failure` says why there is no trim in this case (no free lift: it does not fly at all; the
   * sail and gas lift less than it weighs; no stable pitch); without it, `figures.trim` is there.
   */
  readonly params: { readonly case: "wind" | "gust"; readonly failure?: "no-free-lift" | "cannot-fly" | "no-equilibrium" };
}

/** Which end of the tether line a figure is at. */
export type LineEnd = "lifter" | "anchor";

interface TetherAngleDetails {
  /**
   * `angle` is the worse of the line's two ends (its limit the caution or stop it passes), at
   * `params.end`; `otherEnd` the angle at the other end. Without a line shape (no tether given)
   * there is only the angle at the lifter, and neither `end` nor `otherEnd`.
   */
  readonly figures: { readonly speed: Figure<"speed">; readonly angle: Figure<"angle">; readonly otherEnd?: Figure<"angle"> };
  readonly params: { readonly case: "wind" | "gust"; readonly end?: LineEnd };
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
    /**
     * `tension` (the largest of either end of the line, in `params.case` at `params.end`) against the
     * breaking load or breaking load / factor.
     */
    readonly figures: { readonly tension: Figure<"force">; readonly breakingLoad: Figure<"force"> };
    readonly params: { readonly safetyFactor: number; readonly case: AirCase; readonly end: LineEnd };
  };
  readonly "tether-on-ground": {
    /** The line on the ground in `params.case` (the one with more of it there), of the line out. */
    readonly figures: { readonly onGround: Figure<"distance">; readonly lineOut: Figure<"distance">; readonly speed: Figure<"speed"> };
    readonly params: { readonly case: "wind" | "gust" };
  };
  readonly "helium-top-up": {
    readonly figures: {
      readonly topUpAfter: Figure<"duration">;
      readonly lossPerDay: Figure<"ratio">;
      /** Today's free-lift ratio and the caution limit it falls to. */
      readonly freeLiftRatio: Figure<"ratio">;
    };
    /** Whether the loss was given, comes from the fabric's permeability, or is the flat default. */
    readonly params: { readonly lossSource: LossSource };
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

export interface FlagBase<C extends FlagCode> {
  readonly code: C;
  readonly level: FlagLevel;
  readonly figures: FlagDetails[C]["figures"];
  readonly params: FlagDetails[C]["params"];
  /** The payloads the flag is about, in input order, when it is about some. */
  readonly payloads?: readonly PayloadRef[];
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
