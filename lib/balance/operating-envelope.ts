/**
 * The operating envelope of a setup: where it can fly. A grid of steady winds (0 to 15 m/s by
 * default, as measured at the site's reference height) × line out (10 m to the most it can lift in
 * calm air), and at each point the payload's height above the ground, its blowdown and the worst
 * flag of a full evaluation there. Gusts keep the setup's own gust factor (gust / wind) at every
 * point; a setup without a gust is judged in the steady wind alone. From the same evaluations:
 *  - the wind up to which every flag stays `ok` (and up to which nothing is a `stop`) at the
 *    setup's own line out, scanned on the grid's winds from calm and refined by bisection;
 *  - the line out that puts the tether point at a target height in a given wind (bisection:
 *    more line out never lowers it).
 */
import { evaluateBalance, setupFlight } from "./evaluate";
import { FLAG_LEVEL_RANK, type FlagCode, type FlagLevel } from "../domain/flags";
import { solveFlight } from "./flight";
import type { BalanceInput, DeepReadonly, EnvelopeOptions } from "./schema";

type Input = DeepReadonly<BalanceInput>;

/** Common practice: the winds small lifters are flown in, calm to a strong breeze (Beaufort 6 starts at 10.8 m/s). */
export const DEFAULT_ENVELOPE_MAX_WIND_MS = 15;
export const DEFAULT_ENVELOPE_WIND_COUNT = 16;
export const DEFAULT_ENVELOPE_LINE_COUNT = 20;
/** The shortest line of the grid: below about 10 m a lifter is still in its launcher's hands. */
export const ENVELOPE_MIN_LINE_OUT_M = 10;
const BISECTIONS = 14;

export interface EnvelopePoint {
  readonly windMS: number;
  readonly lineOutM: number;
  /** The tether point's height above the anchor; null where it does not fly. */
  readonly heightAboveGroundM: number | null;
  readonly blowdownM: number | null;
  readonly worstLevel: FlagLevel;
  /** The first flag at the worst level, or null when all are `ok`. */
  readonly worstCode: FlagCode | null;
}

export type EnvelopeFailure = "no-tether" | "no-free-lift" | "too-little-line";

export interface TargetLineOut {
  readonly heightM: number;
  readonly windMS: number;
  /** The line out that reaches the height; null when no line it can lift reaches it. */
  readonly lineOutM: number | null;
}

export interface OperatingEnvelope {
  /** Why there is no grid: no tether given, no free lift, or it lifts less than the shortest line. */
  readonly reason: EnvelopeFailure | null;
  readonly windsMS: readonly number[];
  readonly linesOutM: readonly number[];
  /** points[i][j]: wind windsMS[i], line out linesOutM[j]. */
  readonly points: readonly (readonly EnvelopePoint[])[];
  /** The gust factor the grid's gusts keep (null: no gust). */
  readonly gustFactor: number | null;
  /** The setup's own line out, where the two winds below are found. */
  readonly lineOutM: number | null;
  /** Every flag is `ok` from calm up to this wind; null when not even in calm. */
  readonly highestAllOkWindMS: number | null;
  /** No flag is a `stop` from calm up to this wind; null when not even in calm. */
  readonly highestWithoutStopWindMS: number | null;
  readonly target: TargetLineOut | null;
}

/** The setup at a wind (its gust factor kept) and a line out. */
function at(input: Input, gustFactor: number | null, windMS: number, lineOutM: number): Input {
  const site = { ...input.site, windMS, gustMS: gustFactor === null ? undefined : gustFactor * windMS };
  return { ...input, site, tether: input.tether ? { ...input.tether, lengthOutM: lineOutM } : undefined };
}

function pointAt(input: Input, gustFactor: number | null, windMS: number, lineOutM: number): EnvelopePoint {
  const result = evaluateBalance(at(input, gustFactor, windMS, lineOutM));
  let worstLevel: FlagLevel = "ok";
  let worstCode: FlagCode | null = null;
  for (const flag of result.flags) {
    if (FLAG_LEVEL_RANK[flag.level] > FLAG_LEVEL_RANK[worstLevel]) {
      worstLevel = flag.level;
      worstCode = flag.code;
    }
  }
  const line = result.wind?.line ?? null;
  return {
    windMS,
    lineOutM,
    heightAboveGroundM: line ? line.heightAboveGroundM : null,
    blowdownM: line ? line.blowdownM : null,
    worstLevel,
    worstCode,
  };
}

const spread = (from: number, to: number, count: number): number[] =>
  Array.from({ length: count }, (_, i) => from + ((to - from) * i) / (count - 1));

/** The wind from calm up to which `good` holds at a line out: grid scan, then bisection. */
function highestWind(winds: readonly number[], good: (windMS: number) => boolean): number | null {
  if (!good(winds[0])) return null;
  let low = winds[0];
  for (let i = 1; i < winds.length; i++) {
    if (!good(winds[i])) {
      let high = winds[i];
      for (let b = 0; b < BISECTIONS; b++) {
        const middle = 0.5 * (low + high);
        if (good(middle)) low = middle;
        else high = middle;
      }
      return low;
    }
    low = winds[i];
  }
  return low;
}

/** The tether point's height at a wind and line out (0 where it does not fly). */
function heightAt(input: Input, gustFactor: number | null, windMS: number, lineOutM: number): number {
  const outcome = solveFlight(setupFlight(at(input, gustFactor, windMS, lineOutM)).wind);
  return outcome.case?.line?.heightAboveGroundM ?? 0;
}

function targetLineOut(input: Input, gustFactor: number | null, heightM: number, windMS: number, mostM: number): TargetLineOut {
  if (heightAt(input, gustFactor, windMS, mostM) < heightM) return { heightM, windMS, lineOutM: null };
  let low = 0,
    high = mostM;
  for (let b = 0; b < BISECTIONS + 6; b++) {
    const middle = 0.5 * (low + high);
    if (heightAt(input, gustFactor, windMS, middle) >= heightM) high = middle;
    else low = middle;
  }
  return { heightM, windMS, lineOutM: high };
}

export function operatingEnvelope(input: Input, options: EnvelopeOptions = {}): OperatingEnvelope {
  const site = input.site;
  const gustFactor =
    site?.gustMS !== undefined && (site.windMS ?? 0) > 0 && site.gustMS >= (site.windMS ?? 0) ? site.gustMS / (site.windMS ?? 1) : null;
  const empty = (reason: EnvelopeFailure): OperatingEnvelope => ({
    reason,
    windsMS: [],
    linesOutM: [],
    points: [],
    gustFactor,
    lineOutM: input.tether?.lengthOutM ?? null,
    highestAllOkWindMS: null,
    highestWithoutStopWindMS: null,
    target: null,
  });
  if (!input.tether) return empty("no-tether");
  const calm = evaluateBalance(at(input, null, 0, input.tether.lengthOutM));
  if (!(calm.freeLiftKg > 0)) return empty("no-free-lift");
  const mostM = calm.maxTetherOutM ?? 0;
  if (!(mostM >= ENVELOPE_MIN_LINE_OUT_M)) return empty("too-little-line");

  const windsMS = spread(0, options.maxWindMS ?? DEFAULT_ENVELOPE_MAX_WIND_MS, options.windCount ?? DEFAULT_ENVELOPE_WIND_COUNT);
  const linesOutM = spread(ENVELOPE_MIN_LINE_OUT_M, mostM, options.lineCount ?? DEFAULT_ENVELOPE_LINE_COUNT);
  const points = windsMS.map((windMS) => linesOutM.map((lineOutM) => pointAt(input, gustFactor, windMS, lineOutM)));

  const ownLineM = input.tether.lengthOutM;
  // Both scans start on the same grid winds: evaluate each wind once.
  const levels = new Map<number, FlagLevel>();
  const levelAt = (windMS: number): FlagLevel => {
    let level = levels.get(windMS);
    if (level === undefined) {
      level = pointAt(input, gustFactor, windMS, ownLineM).worstLevel;
      levels.set(windMS, level);
    }
    return level;
  };
  const targetHeightM = options.targetHeightM;
  return {
    reason: null,
    windsMS,
    linesOutM,
    points,
    gustFactor,
    lineOutM: ownLineM,
    highestAllOkWindMS: highestWind(windsMS, (w) => levelAt(w) === "ok"),
    highestWithoutStopWindMS: highestWind(windsMS, (w) => levelAt(w) !== "stop"),
    target:
      targetHeightM === undefined
        ? null
        : targetLineOut(input, gustFactor, targetHeightM, options.targetWindMS ?? site?.windMS ?? 0, mostM),
  };
}

export interface EnvelopeTableRow {
  readonly lineOutM: number;
  /** One cell per wind of the envelope, in its order. */
  readonly cells: readonly EnvelopePoint[];
}

/**
 * The envelope as a table to print: one row per line out, one column per wind (SI; the reader's
 * units are the printer's). Empty when the envelope has no grid.
 */
export function operatingEnvelopeTable(envelope: OperatingEnvelope): {
  readonly windsMS: readonly number[];
  readonly rows: readonly EnvelopeTableRow[];
} {
  return {
    windsMS: envelope.windsMS,
    rows: envelope.linesOutM.map((lineOutM, j) => ({ lineOutM, cells: envelope.points.map((column) => column[j]) })),
  };
}
