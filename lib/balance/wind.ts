/**
 * Wind and gust (design.md item 6). Same frame and moment signs as trim.ts: wind blows along +X
 * (from the nose towards the tail), lift acts up, drag acts downwind.
 *   α = θ − θ₀ (θ₀: the sail's zero-lift trim), q = ½ρV²,
 *   sail lift L = q·S·CLα·α and sail drag D_s = q·S·(CD + CL²/(π·e·AR)) at the pressure centre c
 *   (the second term is the induced drag of lifting-line theory, e.g. Anderson, Fundamentals of
 *   Aerodynamics; only when the model gives its aspect ratio AR; CL = CLα·α),
 *   payload drag D_i = q·A_i at each payload's centre of mass,
 *   M(θ) = −B·X_b + W·X_g − L·X_c + D_s·Z_c + Σ D_i·Z_i = 0 (nose-up positive, about the tether).
 * The stable equilibrium is a root where M falls through zero as θ rises; we scan θ over
 * (−89°, 89°) and refine the crossing nearest the calm trim by Illinois regula falsi (keeps the
 * bracket like bisection, converges superlinearly), without allocating.
 * The tether then pulls along the resultant: angle from vertical = atan(D / (B − W + L)),
 * tension = √(D² + (B − W + L)²). At zero wind the calm formula is returned unchanged.
 * Without free lift it does not fly: it cannot be launched, and it falls in every lull whatever
 * the sail would lift in a steady wind (design.md item 5), so there is no wind case.
 */
import type { LineSummary } from "./tether-line";
import type { CalmTrim, PitchStatics } from "./trim";
import { degreesToRadians, radiansToDegrees } from "./units-si";

/**
 * Span efficiency e of the sail's induced drag when the model gives no figure: 0.7, common practice
 * for a low-aspect-ratio lifting surface on a hull (no published figure for kite-balloons);
 * lifting-line theory's elliptic ideal is e = 1 (Anderson, Fundamentals of Aerodynamics).
 */
export const DEFAULT_SPAN_EFFICIENCY = 0.7;

/** 1/(π·e·AR), the induced drag coefficient per CL²; 0 without an aspect ratio. */
export function inducedDragFactor(aspectRatio: number | undefined, spanEfficiency: number | undefined): number {
  if (!(aspectRatio !== undefined && aspectRatio > 0)) return 0;
  return 1 / (Math.PI * (spanEfficiency ?? DEFAULT_SPAN_EFFICIENCY) * aspectRatio);
}

export interface WindModel {
  readonly statics: PitchStatics;
  readonly sailAreaM2: number;
  readonly liftSlopePerRad: number;
  readonly zeroLiftTrimRad: number;
  readonly dragCoefficient: number;
  /** 1/(π·e·AR): induced drag coefficient per CL²; 0 when the model gives no aspect ratio. */
  readonly inducedDragFactor: number;
  /** Pressure centre relative to the tether point, m. */
  readonly cx: number;
  readonly cz: number;
  /** Payload drag as triplets (drag area m², x, z relative to the tether point). */
  readonly payloadDrag: Float64Array;
}

export interface WindCase {
  /** The wind as given (measured at the site's reference height), m/s. */
  readonly speedMS: number;
  /**
   * The wind at the lifter's own height, which it flies in, m/s (the measured wind when the height
   * is not known: no tether given). Absent from results stored before it existed.
   */
  readonly windAtLifterMS: number;
  readonly trimDeg: number;
  readonly tetherAngleDeg: number;
  readonly tensionN: number;
  readonly dynamicPressurePa: number;
  readonly liftN: number;
  readonly dragN: number;
  /**
   * The tether line's shape from the lifter's pull down to the anchor (tether-line.ts); null without
   * a tether. tetherAngleDeg and tensionN above stay the values at the lifter.
   */
  readonly line: LineSummary | null;
}

/** Why a case has no equilibrium: no stable pitch, too little lift, no calm trim, or no free lift. */
export type WindFailure = "no-equilibrium" | "cannot-fly" | "no-calm-trim" | "no-free-lift";

export type WindOutcome = { readonly case: WindCase; readonly reason: null } | { readonly case: null; readonly reason: WindFailure };

/** q = ½ρV² (Pa). */
export function dynamicPressurePa(airDensityKgM3: number, speedMS: number): number {
  return 0.5 * airDensityKgM3 * speedMS * speedMS;
}

/** Nose-up pitching moment about the tether point at trim θ and dynamic pressure q, N·m. */
export function pitchMomentNm(model: WindModel, dynamicPressure: number, thetaRad: number): number {
  const cos = Math.cos(thetaRad);
  const sin = Math.sin(thetaRad);
  const s = model.statics;
  let moment = -s.buoyancyN * (s.bx * cos + s.bz * sin) + s.weightN * (s.gx * cos + s.gz * sin);
  if (dynamicPressure > 0) {
    const qS = dynamicPressure * model.sailAreaM2;
    const liftCoefficient = model.liftSlopePerRad * (thetaRad - model.zeroLiftTrimRad);
    const liftN = qS * liftCoefficient;
    const sailDragN = qS * (model.dragCoefficient + model.inducedDragFactor * liftCoefficient * liftCoefficient);
    moment += -liftN * (model.cx * cos + model.cz * sin) + sailDragN * (-model.cx * sin + model.cz * cos);
    const drag = model.payloadDrag;
    for (let i = 0; i < drag.length; i += 3) {
      moment += dynamicPressure * drag[i] * (-drag[i + 1] * sin + drag[i + 2] * cos);
    }
  }
  return moment;
}

const SCAN_LOW_RAD = degreesToRadians(-89);
const SCAN_HIGH_RAD = degreesToRadians(89);
const SCAN_STEPS = 60;
const ROOT_TOLERANCE_RAD = 1e-11;

function refineRoot(model: WindModel, q: number, lowRad: number, highRad: number, lowMoment: number, highMoment: number): number {
  let a = lowRad,
    b = highRad,
    fa = lowMoment,
    fb = highMoment;
  let side = 0;
  for (let iteration = 0; iteration < 100 && b - a > ROOT_TOLERANCE_RAD; iteration++) {
    let c = (a * fb - b * fa) / (fb - fa);
    if (!(c > a && c < b)) c = 0.5 * (a + b);
    const fc = pitchMomentNm(model, q, c);
    if (fc === 0) return c;
    if (fc > 0) {
      a = c;
      fa = fc;
      if (side === -1) fb *= 0.5; // Illinois: halve the stale end so it cannot stall.
      side = -1;
    } else {
      b = c;
      fb = fc;
      if (side === 1) fa *= 0.5;
      side = 1;
    }
  }
  return 0.5 * (a + b);
}

/** The stable trim at dynamic pressure q nearest preferRad, or null when there is none. */
export function solvePitchTrimRad(model: WindModel, q: number, preferRad: number): number | null {
  let best: number | null = null;
  let bestDistance = Infinity;
  const step = (SCAN_HIGH_RAD - SCAN_LOW_RAD) / SCAN_STEPS;
  let a = SCAN_LOW_RAD;
  let fa = pitchMomentNm(model, q, a);
  for (let i = 1; i <= SCAN_STEPS; i++) {
    const b = SCAN_LOW_RAD + i * step;
    const fb = pitchMomentNm(model, q, b);
    if (fa > 0 && fb <= 0) {
      const root = fb === 0 ? b : refineRoot(model, q, a, b, fa, fb);
      const distance = Math.abs(root - preferRad);
      if (distance < bestDistance) {
        best = root;
        bestDistance = distance;
      }
    }
    a = b;
    fa = fb;
  }
  return best;
}

/**
 * The stable trim near a trim already found at a nearby dynamic pressure (the same branch as it
 * moves with q): a widening bracket around it, then the full scan if none is found.
 */
export function solvePitchTrimNearRad(model: WindModel, q: number, nearRad: number): number | null {
  for (let half = 0.01; half <= 0.2; half *= 4) {
    const a = Math.max(SCAN_LOW_RAD, nearRad - half);
    const b = Math.min(SCAN_HIGH_RAD, nearRad + half);
    const fa = pitchMomentNm(model, q, a);
    const fb = pitchMomentNm(model, q, b);
    if (fa > 0 && fb <= 0) return fb === 0 ? b : refineRoot(model, q, a, b, fa, fb);
  }
  return solvePitchTrimRad(model, q, nearRad);
}

/** The sail's drag area at a trim: S·(CD + CL²/(π·e·AR)) plus every payload's drag area, m². */
export function dragAreaAtTrimM2(model: WindModel, thetaRad: number): number {
  const liftCoefficient = model.liftSlopePerRad * (thetaRad - model.zeroLiftTrimRad);
  let dragAreaM2 = model.sailAreaM2 * (model.dragCoefficient + model.inducedDragFactor * liftCoefficient * liftCoefficient);
  for (let i = 0; i < model.payloadDrag.length; i += 3) dragAreaM2 += model.payloadDrag[i];
  return dragAreaM2;
}

/**
 * The lifter alone in a wind of `speedMS` at its height (no line): its trim and its pull on the
 * tether. `nearRad`, when given, is a trim found at a nearby wind to continue from.
 */
export function solveWindCase(
  model: WindModel,
  airDensityKgM3: number,
  speedMS: number,
  calm: CalmTrim,
  nearRad: number | null = null,
): WindOutcome {
  const freeLiftN = model.statics.buoyancyN - model.statics.weightN;
  if (!(freeLiftN > 0)) return { case: null, reason: "no-free-lift" };
  if (speedMS === 0) {
    // Zero wind is the calm case, by the same formula.
    if (calm.trimDeg === null) return { case: null, reason: "no-calm-trim" };
    return {
      case: {
        speedMS: 0,
        windAtLifterMS: 0,
        trimDeg: calm.trimDeg,
        tetherAngleDeg: 0,
        tensionN: freeLiftN,
        dynamicPressurePa: 0,
        liftN: 0,
        dragN: 0,
        line: null,
      },
      reason: null,
    };
  }
  const q = dynamicPressurePa(airDensityKgM3, speedMS);
  const thetaRad = nearRad === null ? solvePitchTrimRad(model, q, calm.trimRad ?? 0) : solvePitchTrimNearRad(model, q, nearRad);
  if (thetaRad === null) return { case: null, reason: "no-equilibrium" };
  const liftN = q * model.sailAreaM2 * model.liftSlopePerRad * (thetaRad - model.zeroLiftTrimRad);
  const dragN = q * dragAreaAtTrimM2(model, thetaRad);
  const verticalN = freeLiftN + liftN;
  if (!(verticalN > 0)) return { case: null, reason: "cannot-fly" };
  return {
    case: {
      speedMS,
      windAtLifterMS: speedMS,
      trimDeg: radiansToDegrees(thetaRad),
      tetherAngleDeg: radiansToDegrees(Math.atan2(dragN, verticalN)),
      tensionN: Math.hypot(dragN, verticalN),
      dynamicPressurePa: q,
      liftN,
      dragN,
      line: null,
    },
    reason: null,
  };
}
