/**
 * Calm trim (design.md item 5). About the tether point T, with b = buoyancy centre − T and
 * g = centre of mass − T, a body point (x, z) pitched by θ (nose up positive) sits at horizontal
 * arm X = x·cosθ + z·sinθ (downwind/aft positive) and height Z = −x·sinθ + z·cosθ. Moments are
 * taken nose-up positive: an upward force F at arm X gives −F·X, a downwind force D at height Z
 * gives +D·Z. In calm air the moment is M(θ) = −B·X_b + W·X_g = 0, so
 *   tanθ = (B·b_x − W·g_x) / (W·g_z − B·b_z),
 * and dM/dθ at that root has the sign of W·g_z − B·b_z: the trim is stable (restoring) only when
 * W·g_z − B·b_z < 0, i.e. buoyancy pulls from far enough above the tether point.
 */
import { STANDARD_GRAVITY_MS2, radiansToDegrees } from "./units-si";
import type { Vec } from "./vec";

export interface PitchStatics {
  /** Gross lift as a force, N. */
  readonly buoyancyN: number;
  /** Weight of everything in the setup's total mass, N. */
  readonly weightN: number;
  /** Buoyancy centre and centre of mass relative to the tether point, m. */
  readonly bx: number;
  readonly bz: number;
  readonly gx: number;
  readonly gz: number;
}

export function pitchStatics(
  grossLiftKg: number,
  totalMassKg: number,
  buoyancyCentre: Vec,
  centreOfMass: Vec,
  tetherPoint: Vec,
): PitchStatics {
  return {
    buoyancyN: grossLiftKg * STANDARD_GRAVITY_MS2,
    weightN: totalMassKg * STANDARD_GRAVITY_MS2,
    bx: buoyancyCentre.x - tetherPoint.x,
    bz: buoyancyCentre.z - tetherPoint.z,
    gx: centreOfMass.x - tetherPoint.x,
    gz: centreOfMass.z - tetherPoint.z,
  };
}

export type CalmTrim =
  | { readonly trimDeg: number; readonly trimRad: number; readonly reason: null }
  | { readonly trimDeg: null; readonly trimRad: null; readonly reason: "no-free-lift" | "unstable" };

/** Pitch stiffness term W·g_z − B·b_z (N·m); negative means the calm trim is stable. */
export function calmStiffnessNm(statics: PitchStatics): number {
  return statics.weightN * statics.gz - statics.buoyancyN * statics.bz;
}

export function calmTrim(statics: PitchStatics, freeLiftKg: number): CalmTrim {
  if (!(freeLiftKg > 0)) return { trimDeg: null, trimRad: null, reason: "no-free-lift" };
  const denominator = calmStiffnessNm(statics);
  if (!(denominator < 0)) return { trimDeg: null, trimRad: null, reason: "unstable" };
  const numerator = statics.buoyancyN * statics.bx - statics.weightN * statics.gx;
  // denominator < 0, so atan keeps |θ| < 90°, the stable one of the two roots.
  const trimRad = Math.atan(numerator / denominator);
  return { trimDeg: radiansToDegrees(trimRad), trimRad, reason: null };
}
