/**
 * Tether (design.md item 9). The line's weight hangs at the tether point, so it eats free lift
 * without moving the trim. In calm air the most line the lifter can hold up is
 * free lift / mass per metre.
 */
import { figure, makeFlag, type AirCase, type Flag, type Limits } from "./flags";
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
  largestTension: { readonly tensionN: number; readonly case: AirCase },
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
      out.push(makeFlag("tether-length", "stop", {
        figures: { lineOut, lineMass: figure("mass", lineKg), freeLift: figure("mass", freeLiftKg) }, params: {},
      }));
    } else if (leftRatio < limits.cautionFreeLiftRatio && ratio >= limits.cautionFreeLiftRatio) {
      // A caution only when the line is what takes the margin below the limit; a margin already
      // below it is the free-lift flag's caution, not a second one.
      out.push(makeFlag("tether-length", "caution", {
        figures: { lineOut, freeLiftLeft: figure("ratio", leftRatio, limits.cautionFreeLiftRatio) }, params: {},
      }));
    } else {
      out.push(makeFlag("tether-length", "ok", { figures: { lineOut }, params: {} }));
    }
  }

  const breakingN = tether.breakingLoadN;
  const tensionN = largestTension.tensionN;
  const breakingLoad = figure("force", breakingN);
  const params = { safetyFactor: limits.tetherSafetyFactor, case: largestTension.case };
  out.push(tensionN >= breakingN
    ? makeFlag("tether-strength", "stop", { figures: { tension: figure("force", tensionN, breakingN), breakingLoad }, params })
    : makeFlag("tether-strength", tensionN * limits.tetherSafetyFactor > breakingN ? "caution" : "ok", {
      figures: { tension: figure("force", tensionN, breakingN / limits.tetherSafetyFactor), breakingLoad }, params,
    }));
}

/** Weight of the line out, N (for callers who show it). */
export function tetherWeightN(tether: TetherInput): number {
  return tether.lengthOutM * tether.massPerMetreKg * STANDARD_GRAVITY_MS2;
}
