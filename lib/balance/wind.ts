/**
 * Wind and gust (design.md item 6). Same frame and moment signs as trim.ts: wind blows along +X
 * (from the nose towards the tail), lift acts up, drag acts downwind.
 *   α = θ − θ₀ (θ₀: the sail's zero-lift trim), q = ½ρV²,
 *   sail lift L = q·S·CLα·α and sail drag D_s = q·S·CD at the pressure centre c,
 *   payload drag D_i = q·A_i at each payload's centre of mass,
 *   M(θ) = −B·X_b + W·X_g − L·X_c + D_s·Z_c + Σ D_i·Z_i = 0 (nose-up positive, about the tether).
 * The stable equilibrium is a root where M falls through zero as θ rises; we scan θ over
 * (−89°, 89°) and refine the crossing nearest the calm trim by Illinois regula falsi (keeps the
 * bracket like bisection, converges superlinearly), without allocating.
 * The tether then pulls along the resultant: angle from vertical = atan(D / (B − W + L)),
 * tension = √(D² + (B − W + L)²). At zero wind the calm formula is returned unchanged.
 */
import type { CalmTrim, PitchStatics } from "./trim";
import { degreesToRadians, radiansToDegrees } from "./units-si";

export interface WindModel {
  readonly statics: PitchStatics;
  readonly sailAreaM2: number;
  readonly liftSlopePerRad: number;
  readonly zeroLiftTrimRad: number;
  readonly dragCoefficient: number;
  /** Pressure centre relative to the tether point, m. */
  readonly cx: number;
  readonly cz: number;
  /** Payload drag as triplets (drag area m², x, z relative to the tether point). */
  readonly payloadDrag: Float64Array;
}

export interface WindCase {
  readonly speedMS: number;
  readonly trimDeg: number;
  readonly tetherAngleDeg: number;
  readonly tensionN: number;
  readonly dynamicPressurePa: number;
  readonly liftN: number;
  readonly dragN: number;
}

export type WindOutcome =
  | { readonly case: WindCase; readonly reason: null }
  | { readonly case: null; readonly reason: "no-equilibrium" | "cannot-fly" | "no-calm-trim" };

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
    const liftN = qS * model.liftSlopePerRad * (thetaRad - model.zeroLiftTrimRad);
    const sailDragN = qS * model.dragCoefficient;
    moment += -liftN * (model.cx * cos + model.cz * sin) +
      sailDragN * (-model.cx * sin + model.cz * cos);
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

function refineRoot(model: WindModel, q: number, lowRad: number, highRad: number,
  lowMoment: number, highMoment: number): number {
  let a = lowRad, b = highRad, fa = lowMoment, fb = highMoment;
  let side = 0;
  for (let iteration = 0; iteration < 100 && b - a > ROOT_TOLERANCE_RAD; iteration++) {
    let c = (a * fb - b * fa) / (fb - fa);
    if (!(c > a && c < b)) c = 0.5 * (a + b);
    const fc = pitchMomentNm(model, q, c);
    if (fc === 0) return c;
    if (fc > 0) {
      a = c; fa = fc;
      if (side === -1) fb *= 0.5; // Illinois: halve the stale end so it cannot stall.
      side = -1;
    } else {
      b = c; fb = fc;
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

export function solveWindCase(
  model: WindModel,
  airDensityKgM3: number,
  speedMS: number,
  calm: CalmTrim,
): WindOutcome {
  const freeLiftN = model.statics.buoyancyN - model.statics.weightN;
  if (speedMS === 0) {
    // Zero wind is the calm case, by the same formula.
    if (calm.trimDeg === null) return { case: null, reason: "no-calm-trim" };
    return {
      case: {
        speedMS: 0, trimDeg: calm.trimDeg, tetherAngleDeg: 0, tensionN: freeLiftN,
        dynamicPressurePa: 0, liftN: 0, dragN: 0,
      },
      reason: null,
    };
  }
  const q = dynamicPressurePa(airDensityKgM3, speedMS);
  const thetaRad = solvePitchTrimRad(model, q, calm.trimRad ?? 0);
  if (thetaRad === null) return { case: null, reason: "no-equilibrium" };
  const qS = q * model.sailAreaM2;
  const liftN = qS * model.liftSlopePerRad * (thetaRad - model.zeroLiftTrimRad);
  let dragAreaM2 = model.sailAreaM2 * model.dragCoefficient;
  for (let i = 0; i < model.payloadDrag.length; i += 3) dragAreaM2 += model.payloadDrag[i];
  const dragN = q * dragAreaM2;
  const verticalN = freeLiftN + liftN;
  if (!(verticalN > 0)) return { case: null, reason: "cannot-fly" };
  return {
    case: {
      speedMS,
      trimDeg: radiansToDegrees(thetaRad),
      tetherAngleDeg: radiansToDegrees(Math.atan2(dragN, verticalN)),
      tensionN: Math.hypot(dragN, verticalN),
      dynamicPressurePa: q,
      liftN,
      dragN,
    },
    reason: null,
  };
}
