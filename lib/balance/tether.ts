/**
 * Tether (design.md item 9). The line's weight hangs at the tether point, so it eats free lift
 * without moving the trim. In calm air the most line the lifter can hold up is
 * free lift / mass per metre. The line's shape in wind is tether-line.ts's.
 */
import { figure, makeFlag, type AirCase, type Flag, type LineEnd, type Limits } from "./flags";
import type { LineSpec } from "./tether-line";
import { STANDARD_GRAVITY_MS2 } from "./units-si";

export function maxTetherOutM(freeLiftKg: number, massPerMetreKg: number): number {
  return Math.max(0, freeLiftKg) / massPerMetreKg;
}

export interface TetherInput {
  readonly massPerMetreKg: number;
  readonly lengthOutM: number;
  readonly breakingLoadN: number;
}

export function tetherFlags(
  tether: TetherInput,
  grossLiftKg: number,
  freeLiftKg: number,
  largestTension: { readonly tensionN: number; readonly case: AirCase; readonly end: LineEnd },
  limits: Limits,
  out: Flag[],
): void {
  const maxOutM = maxTetherOutM(freeLiftKg, tether.massPerMetreKg);
  const lineKg = tether.lengthOutM * tether.massPerMetreKg;
  const ratio = grossLiftKg > 0 ? freeLiftKg / grossLiftKg : -1;
  const leftRatio = grossLiftKg > 0 ? (freeLiftKg - lineKg) / grossLiftKg : -1;
  const lineOut = figure("distance", tether.lengthOutM, maxOutM);
  // Without free lift the free-lift flag already says it does not fly: no second flag for the line.
  if (freeLiftKg > 0) {
    if (tether.lengthOutM >= maxOutM) {
      out.push(
        makeFlag("tether-length", "stop", {
          figures: { lineOut, lineMass: figure("mass", lineKg), freeLift: figure("mass", freeLiftKg) },
          params: {},
        }),
      );
    } else if (leftRatio < limits.cautionFreeLiftRatio && ratio >= limits.cautionFreeLiftRatio) {
      // A caution only when the line is what takes the margin below the limit; a margin already
      // below it is the free-lift flag's caution, not a second one.
      out.push(
        makeFlag("tether-length", "caution", {
          figures: { lineOut, freeLiftLeft: figure("ratio", leftRatio, limits.cautionFreeLiftRatio) },
          params: {},
        }),
      );
    } else {
      out.push(makeFlag("tether-length", "ok", { figures: { lineOut }, params: {} }));
    }
  }

  const breakingN = tether.breakingLoadN;
  const tensionN = largestTension.tensionN;
  const breakingLoad = figure("force", breakingN);
  const params = { safetyFactor: limits.tetherSafetyFactor, case: largestTension.case, end: largestTension.end };
  out.push(
    tensionN >= breakingN
      ? makeFlag("tether-strength", "stop", { figures: { tension: figure("force", tensionN, breakingN), breakingLoad }, params })
      : makeFlag("tether-strength", tensionN * limits.tetherSafetyFactor > breakingN ? "caution" : "ok", {
          figures: { tension: figure("force", tensionN, breakingN / limits.tetherSafetyFactor), breakingLoad },
          params,
        }),
  );
}

/** Weight of the line out, N (for callers who show it). */
export function tetherWeightN(tether: TetherInput): number {
  return tether.lengthOutM * tether.massPerMetreKg * STANDARD_GRAVITY_MS2;
}

/**
 * C_n of a circular cylinder in cross-flow below the critical Reynolds number (about 10³–10⁵, a
 * thin line in a breeze): 1.0–1.2; the upper end is taken (Hoerner, Fluid-Dynamic Drag, 1965).
 */
export const DEFAULT_NORMAL_DRAG_COEFFICIENT = 1.2;
/** C_f of the air running along a braided line: 0.01, common practice. */
export const DEFAULT_SKIN_FRICTION_COEFFICIENT = 0.01;

export interface TetherLineInput extends TetherInput {
  readonly diameterM?: number;
  readonly normalDragCoefficient?: number;
  readonly skinFrictionCoefficient?: number;
}

/** The line's loads per metre: its weight, and its drag per ½ρV² when it has a diameter. */
export function lineSpecFor(tether: TetherLineInput, airDensityKgM3: number): LineSpec {
  const d = tether.diameterM ?? 0;
  return {
    lengthM: tether.lengthOutM,
    weightPerMetreN: tether.massPerMetreKg * STANDARD_GRAVITY_MS2,
    normalDragAreaPerMetreM: d * (tether.normalDragCoefficient ?? DEFAULT_NORMAL_DRAG_COEFFICIENT),
    skinFrictionAreaPerMetreM: Math.PI * d * (tether.skinFrictionCoefficient ?? DEFAULT_SKIN_FRICTION_COEFFICIENT),
    airDensityKgM3,
  };
}
