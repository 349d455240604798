/**
 * The flags evaluateBalance raises from its cases: free lift, rail, calm trim, wind and gust
 * (trim and tether angle at the worse end of the line), the line on the ground, clearance, and
 * the largest tension the tether must hold. Each pushes into `out`; none mutates its inputs.
 */
import { hullClearanceM, tetherClearanceM } from "./clearance";
import { figure, findingsByPayload, makeFlag, type AirCase, type Flag, type LineEnd, type Limits } from "./flags";
import type { BalanceInput, DeepReadonly } from "./schema";
import type { CalmTrim } from "./trim";
import { STANDARD_GRAVITY_MS2, degreesToRadians } from "./units-si";
import type { Vec } from "./vec";
import type { WindCase, WindOutcome } from "./wind";

type Input = DeepReadonly<BalanceInput>;

export function calmFlags(calm: CalmTrim, limits: Limits, out: Flag[]): void {
  // Without free lift there is no calm trim, but the free-lift flag already says it does not fly.
  if (calm.reason === "no-free-lift") return;
  if (calm.trimRad === null) {
    out.push(makeFlag("trim-unstable", "stop", { figures: {}, params: {} }));
    return;
  }
  const trim = figure("angle", calm.trimRad, degreesToRadians(limits.cautionTrimDeg));
  out.push(makeFlag("trim-calm", Math.abs(calm.trimDeg) > limits.cautionTrimDeg ? "caution" : "ok", { figures: { trim }, params: {} }));
}

const levelOf = (size: number, caution: number, stop: number): "ok" | "caution" | "stop" =>
  size > stop ? "stop" : size > caution ? "caution" : "ok";

export function windFlags(outcome: WindOutcome, speedMS: number, airCase: "wind" | "gust", limits: Limits, out: Flag[]): void {
  const trimCode = airCase === "wind" ? "trim-wind" : "trim-gust";
  const angleCode = airCase === "wind" ? "tether-angle-wind" : "tether-angle-gust";
  const speed = figure("speed", speedMS);
  const c = outcome.case;
  if (!c) {
    // A lifter that does not fly gets no ok wind flags: each says why there is no case.
    const failure = outcome.reason === "no-free-lift" ? "no-free-lift" : outcome.reason === "cannot-fly" ? "cannot-fly" : "no-equilibrium";
    out.push(makeFlag(trimCode, "stop", { figures: { speed }, params: { case: airCase, failure } }));
    return;
  }
  const trimLevel = levelOf(Math.abs(c.trimDeg), limits.cautionTrimDeg, limits.stopTrimDeg);
  const trimLimitDeg = trimLevel === "stop" ? limits.stopTrimDeg : limits.cautionTrimDeg;
  out.push(
    makeFlag(trimCode, trimLevel, {
      figures: { speed, trim: figure("angle", degreesToRadians(c.trimDeg), degreesToRadians(trimLimitDeg)) },
      params: { case: airCase },
    }),
  );
  // The worse of the line's two ends: a heavy, draggy line meets the ground flatter than it
  // leaves the lifter.
  const lifterDeg = c.tetherAngleDeg;
  const anchorDeg = c.line?.anchorAngleDeg;
  const end: LineEnd = anchorDeg !== undefined && anchorDeg > lifterDeg ? "anchor" : "lifter";
  const worstDeg = end === "anchor" ? (anchorDeg ?? lifterDeg) : lifterDeg;
  const angleLevel = levelOf(worstDeg, limits.cautionTetherAngleDeg, limits.stopTetherAngleDeg);
  const angleLimitDeg = angleLevel === "stop" ? limits.stopTetherAngleDeg : limits.cautionTetherAngleDeg;
  const angle = figure("angle", degreesToRadians(worstDeg), degreesToRadians(angleLimitDeg));
  out.push(
    anchorDeg === undefined
      ? makeFlag(angleCode, angleLevel, { figures: { speed, angle }, params: { case: airCase } })
      : makeFlag(angleCode, angleLevel, {
          figures: { speed, angle, otherEnd: figure("angle", degreesToRadians(end === "anchor" ? lifterDeg : anchorDeg)) },
          params: { case: airCase, end },
        }),
  );
}

/** The case (wind or gust, in wind) with the most line on the ground says so; calm air is the tether-length flag's. */
export function lineOnGroundFlag(wind: WindCase | null, gust: WindCase | null, lineOutM: number, out: Flag[]): void {
  let worst: { c: WindCase; airCase: "wind" | "gust" } | null = null;
  for (const [c, airCase] of [
    [wind, "wind"],
    [gust, "gust"],
  ] as const) {
    if (
      c &&
      c.speedMS > 0 &&
      c.line &&
      c.line.lengthOnGroundM > 0 &&
      (!worst || c.line.lengthOnGroundM > (worst.c.line?.lengthOnGroundM ?? 0))
    )
      worst = { c, airCase };
  }
  if (!worst) return;
  out.push(
    makeFlag("tether-on-ground", "caution", {
      figures: {
        onGround: figure("distance", worst.c.line?.lengthOnGroundM ?? 0),
        lineOut: figure("distance", lineOutM),
        speed: figure("speed", worst.c.speedMS),
      },
      params: { case: worst.airCase },
    }),
  );
}

export function freeLiftFlag(freeLiftKg: number, freeLiftRatio: number, limits: Limits): Flag {
  const freeLift = figure("mass", freeLiftKg);
  if (!(freeLiftKg > 0)) return makeFlag("free-lift", "stop", { figures: { freeLift }, params: {} });
  const ratio = figure("ratio", freeLiftRatio, limits.cautionFreeLiftRatio);
  return makeFlag("free-lift", freeLiftRatio < limits.cautionFreeLiftRatio ? "caution" : "ok", {
    figures: { freeLift, ratio },
    params: {},
  });
}

export function railFlag(positionX: number, rail: Input["envelope"]["rail"]): Flag {
  const railStart = figure("smallLength", rail.startX);
  const railEnd = figure("smallLength", rail.endX);
  const passed = positionX < rail.startX ? rail.startX : positionX > rail.endX ? rail.endX : null;
  return passed === null
    ? makeFlag("mount-off-rail", "ok", { figures: { position: figure("smallLength", positionX), railStart, railEnd }, params: {} })
    : makeFlag("mount-off-rail", "stop", {
        figures: { position: figure("smallLength", positionX, passed), railStart, railEnd },
        params: {},
      });
}

type GapLevel = "ok" | "caution" | "stop";

/**
 * Clearance at the wind case (calm when there is no wind); the tether check only when it flies.
 * Near the lifter the line is straight along the lifter's pull: it leaves the tether point
 * towards the anchor, upwind and down, so in the body frame (pitched by the trim θ, nose up +)
 * its angle from −z towards +x is θ − tether angle.
 */
export function clearanceFlags(input: Input, centres: readonly Vec[], flying: WindCase | null, limits: Limits, out: Flag[]): void {
  const { envelope, payloads } = input;
  const hull = envelope.hull;
  const lineLengthM = input.tether?.lengthOutM ?? 100;
  const windMS = input.site?.windMS ?? 0;
  const level = (gapM: number, touching: boolean): GapLevel => (touching ? "stop" : gapM < limits.clearanceCautionM ? "caution" : "ok");
  // Identical payloads at the same place have the same gap: one flag names them all.
  const hullGaps = findingsByPayload<{ gapM: number; level: GapLevel }>();
  const lineGaps = findingsByPayload<{ gapM: number; level: GapLevel }>();
  const lineAngleRad = flying ? degreesToRadians(flying.trimDeg - flying.tetherAngleDeg) : 0;
  for (let i = 0; i < payloads.length; i++) {
    const ref = { index: i, name: payloads[i].name };
    const size = payloads[i].size;
    if (hull) {
      const gapM = hullClearanceM(hull, centres[i], size);
      const gapLevel = level(gapM, gapM < 0);
      hullGaps.add(`${gapLevel}|${gapM}`, ref, { gapM, level: gapLevel });
    }
    if (flying) {
      const gapM = tetherClearanceM(envelope.tetherPoint, lineAngleRad, lineLengthM, centres[i], size);
      const gapLevel = level(gapM, gapM <= 0);
      lineGaps.add(`${gapLevel}|${gapM}`, ref, { gapM, level: gapLevel });
    }
  }
  for (const { finding, payloads: refs } of hullGaps.groups()) {
    const gap = figure("smallLength", finding.gapM, finding.level === "stop" ? undefined : limits.clearanceCautionM);
    out.push(makeFlag("clearance-hull", finding.level, { figures: { gap }, params: {}, payloads: refs }));
  }
  const speed = windMS > 0 ? figure("speed", windMS) : undefined;
  for (const { finding, payloads: refs } of lineGaps.groups()) {
    const gap = figure("smallLength", finding.gapM, finding.level === "stop" ? undefined : limits.clearanceCautionM);
    out.push(makeFlag("clearance-tether", finding.level, { figures: speed ? { gap, speed } : { gap }, params: {}, payloads: refs }));
  }
}

export interface LargestTension {
  readonly tensionN: number;
  readonly case: AirCase;
  readonly end: LineEnd;
}

/** The largest tether tension of the calm, wind and gust cases at either end of the line. */
export function largestTension(freeLiftKg: number, wind: WindCase | null, gust: WindCase | null): LargestTension {
  // In calm air the line only loses tension on the way down (its weight): the lifter's end is the larger.
  let largest: LargestTension = { tensionN: Math.max(0, freeLiftKg) * STANDARD_GRAVITY_MS2, case: "calm", end: "lifter" };
  for (const [c, airCase] of [
    [wind, "wind"],
    [gust, "gust"],
  ] as const) {
    if (!c || !(c.speedMS > 0)) continue;
    if (c.tensionN > largest.tensionN) largest = { tensionN: c.tensionN, case: airCase, end: "lifter" };
    const anchorN = c.line?.anchorTensionN ?? 0;
    if (anchorN > largest.tensionN) largest = { tensionN: anchorN, case: airCase, end: "anchor" };
  }
  return largest;
}
