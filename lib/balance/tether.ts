/**
 * Tether (design.md item 9). The line's weight hangs at the tether point, so it eats free lift
 * without moving the trim. In calm air the most line the lifter can hold up is
 * free lift / mass per metre.
 */
import { fixed, makeFlag, percent, type Flag, type Limits } from "./flags";
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
  largestTensionN: number,
  limits: Limits,
  out: Flag[],
): void {
  const maxOutM = maxTetherOutM(freeLiftKg, tether.massPerMetreKg);
  const lineKg = tether.lengthOutM * tether.massPerMetreKg;
  const leftRatio = grossLiftKg > 0 ? (freeLiftKg - lineKg) / grossLiftKg : -1;
  if (freeLiftKg > 0 && tether.lengthOutM >= maxOutM) {
    out.push(makeFlag("tether-length", "stop",
      `${fixed(tether.lengthOutM, 0)} m of tether weighs ${fixed(lineKg, 3)} kg, more than the ` +
      `free lift; at most ${fixed(maxOutM, 0)} m can be held up in calm air.`, tether.lengthOutM, maxOutM));
  } else if (freeLiftKg > 0 && leftRatio < limits.cautionFreeLiftRatio) {
    out.push(makeFlag("tether-length", "caution",
      `With ${fixed(tether.lengthOutM, 0)} m out, free lift left is ${percent(leftRatio)} of gross lift; ` +
      `caution below ${percent(limits.cautionFreeLiftRatio)} (limit ${fixed(maxOutM, 0)} m).`,
      tether.lengthOutM, maxOutM));
  } else if (freeLiftKg > 0) {
    out.push(makeFlag("tether-length", "ok",
      `${fixed(tether.lengthOutM, 0)} m of tether out; the lifter holds up at most ${fixed(maxOutM, 0)} m.`,
      tether.lengthOutM, maxOutM));
  }

  const breakingN = tether.breakingLoadN;
  const text = `Largest tether tension is ${fixed(largestTensionN, 1)} N; the tether breaks at ${fixed(breakingN, 0)} N`;
  out.push(largestTensionN >= breakingN
    ? makeFlag("tether-strength", "stop", `${text}.`, largestTensionN, breakingN)
    : largestTensionN * limits.tetherSafetyFactor > breakingN
      ? makeFlag("tether-strength", "caution", `${text}; keep ${limits.tetherSafetyFactor}× margin.`,
        largestTensionN, breakingN / limits.tetherSafetyFactor)
      : makeFlag("tether-strength", "ok", `${text}.`, largestTensionN, breakingN / limits.tetherSafetyFactor));
}

/** Weight of the line out, N (for callers who show it). */
export function tetherWeightN(tether: TetherInput): number {
  return tether.lengthOutM * tether.massPerMetreKg * STANDARD_GRAVITY_MS2;
}
