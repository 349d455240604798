/**
 * The tether line's static shape (design.md item 11): an inextensible line with weight per metre
 * w and the air's force on it, hanging from the lifter's pull at the bridle down to the anchor.
 *
 * Equilibrium of a piece of line (the cable equation, Irvine, Cable Structures, 1981, ch. 1): with
 * P = (H, V) the tension vector along the line and σ the length measured down from the lifter,
 *   dP/dσ = f(σ),  P(0) = the lifter's pull,  dr/dσ = −P/|P|,
 * where f is the load per metre on the line. The load is its weight (0, −w) plus the air's force
 * by the cross-flow principle (Hoerner, Fluid-Dynamic Drag, 1965; as in lumped-mass tether models,
 * e.g. Lambert & Nahon, AIAA 2003): the wind U (along +x, at the piece's own height) splits into
 *   V_n = U − (U·t)t normal to the line → ½ρ·d·C_n·|V_n|·V_n per metre, and
 *   V_t = (U·t)t along it             → ½ρ·π·d·C_f·|V_t|·V_t per metre (skin friction),
 * t = P/|P| the line's direction towards the lifter. Without drag this is the catenary.
 * The equations are integrated by the classical fourth-order Runge–Kutta method in σ, with a
 * fixed number of steps, from the lifter down.
 *
 * Where the vertical tension V falls to zero before the anchor, the line touches the ground and the
 * rest lies on it. Ground friction is neglected: the horizontal tension then pulls that rest
 * straight, downwind from the anchor (in still air, with no horizontal tension, it lies in a heap
 * at the anchor under a line that hangs straight down).
 * Frame: x downwind, z up, both relative to the tether point; forces in N, lengths in m.
 */
import type { Vec } from "./vec";
import type { WindProfile } from "./wind-profile";
import { radiansToDegrees } from "./units-si";

/** The line's own properties, as loads per metre. */
export interface LineSpec {
  readonly lengthM: number;
  /** w = mass per metre · g0. */
  readonly weightPerMetreN: number;
  /** d · C_n, m: the cross-flow drag per metre is this × ½ρV_n|V_n|. 0 without a diameter. */
  readonly normalDragAreaPerMetreM: number;
  /** π · d · C_f, m: the skin friction per metre is this × ½ρV_t|V_t|. */
  readonly skinFrictionAreaPerMetreM: number;
  readonly airDensityKgM3: number;
}

/** The lifter's pull on the line's top end: downwind and up, N. */
export interface LinePull {
  readonly downwindN: number;
  readonly upN: number;
}

/** The line's shape as the wind case reports it. */
export interface LineSummary {
  /** The tether point's height above the anchor (the ground), m. */
  readonly heightAboveGroundM: number;
  /** How far downwind of the anchor the tether point is, m. */
  readonly blowdownM: number;
  /** The line's angle from vertical where it leaves the anchor (or the ground), degrees. */
  readonly anchorAngleDeg: number;
  /** Tension at the anchor, N. */
  readonly anchorTensionN: number;
  /** Line lying on the ground, m (0 when it all hangs in the air). */
  readonly lengthOnGroundM: number;
}

export interface LineSolution extends LineSummary {
  /** Tension components at the anchor end (downwind, up), N: the anchor holds their opposite. */
  readonly anchorDownwindN: number;
  readonly anchorUpN: number;
}

/**
 * RK4 steps along the line: within about a centimetre per 100 m of line against a 4000-step
 * solution at winds to 15 m/s, and within 1e-6 of the catenary's height when there is no drag.
 */
export const LINE_STEPS = 16;

/** The loads of one integration, flattened for the inner loop. */
interface Loads {
  readonly w: number;
  readonly normal: number;
  readonly along: number;
  readonly halfRho: number;
  readonly windMS: number;
  readonly referenceHeightM: number;
  readonly exponent: number;
  readonly topHeightM: number;
  readonly drag: boolean;
}

// The derivative's result: module scratch, so that the inner loop allocates nothing.
let dH = 0,
  dV = 0,
  dX = 0,
  dZ = 0;

/** The wind at a height on the line (relative z), by the power law of wind-profile.ts. */
function windAt(loads: Loads, z: number): number {
  if (loads.exponent === 0) return loads.windMS;
  const heightM = loads.topHeightM + z;
  return heightM > 0 ? loads.windMS * Math.pow(heightM / loads.referenceHeightM, loads.exponent) : 0;
}

/**
 * The wind at z from a nearby known one (at z0): V(z) ≈ V(z0)·(1 + α·(z − z0)/Z0) when the two are
 * within 1e-3 of the height apart (the second-order term is then below 1e-7 of V), else exactly.
 * RK4's second and third stages, and one step's last stage and the next one's first, sit that
 * close, so a step needs two powers instead of four.
 */
function windNear(loads: Loads, z: number, z0: number, wind0: number): number {
  if (loads.exponent === 0) return loads.windMS;
  const height0 = loads.topHeightM + z0;
  const dz = z - z0;
  if (height0 > 0 && Math.abs(dz) <= 1e-3 * height0) return wind0 * (1 + (loads.exponent * dz) / height0);
  return windAt(loads, z);
}

/** d(H, V, x, z)/dσ at tension (h, v) in a wind of windMS, into dH, dV, dX, dZ. */
function derivative(loads: Loads, h: number, v: number, windMS: number): void {
  const tension = Math.sqrt(h * h + v * v);
  // With no horizontal tension (still air) the line hangs straight down, also at a stage that
  // looks a hair past the touchdown (V a rounding below zero) and where it goes slack (T = 0).
  const c = tension > 0 ? h / tension : 0;
  const n = tension > 0 && h > 0 ? v / tension : 1;
  let fx = 0;
  let fz = -loads.w;
  if (loads.drag) {
    const q = loads.halfRho * windMS * windMS;
    const normal = q * loads.normal * Math.abs(n);
    const along = q * loads.along * Math.abs(c);
    // V_n = U·n·(n, −c) and V_t = U·c·(c, n): each force follows its velocity, scaled by |V|.
    fx += normal * n * n + along * c * c;
    fz += -normal * n * c + along * c * n;
  }
  dH = fx;
  dV = fz;
  dX = -c;
  dZ = -n;
}

// One RK4 step's result, and the wind at its end.
let sH = 0,
  sV = 0,
  sX = 0,
  sZ = 0,
  sWind = 0;

/** One classical RK4 step of length ds from (h, v, x, z), where the wind is `wind`, into sH…sWind. */
function rk4Step(loads: Loads, h: number, v: number, x: number, z: number, wind: number, ds: number): void {
  derivative(loads, h, v, wind);
  const h1 = dH,
    v1 = dV,
    x1 = dX,
    z1 = dZ;
  const zb = z + 0.5 * ds * z1;
  const windB = loads.drag ? windAt(loads, zb) : 0;
  derivative(loads, h + 0.5 * ds * h1, v + 0.5 * ds * v1, windB);
  const h2 = dH,
    v2 = dV,
    x2 = dX,
    z2 = dZ;
  const zc = z + 0.5 * ds * z2;
  derivative(loads, h + 0.5 * ds * h2, v + 0.5 * ds * v2, loads.drag ? windNear(loads, zc, zb, windB) : 0);
  const h3 = dH,
    v3 = dV,
    x3 = dX,
    z3 = dZ;
  const zd = z + ds * z3;
  const windD = loads.drag ? windAt(loads, zd) : 0;
  derivative(loads, h + ds * h3, v + ds * v3, windD);
  const sixth = ds / 6;
  sH = h + sixth * (h1 + 2 * h2 + 2 * h3 + dH);
  sV = v + sixth * (v1 + 2 * v2 + 2 * v3 + dV);
  sX = x + sixth * (x1 + 2 * x2 + 2 * x3 + dX);
  sZ = z + sixth * (z1 + 2 * z2 + 2 * z3 + dZ);
  sWind = loads.drag ? windNear(loads, sZ, zd, windD) : 0;
}

/**
 * The displacement along a piece of line of length `lengthM` whose tension goes linearly from
 * (h0, v0) to (h1, v1), i.e. under a constant load f = ΔP/length: into sX, sZ. With f along the
 * unit u and e ⊥ u, P = a(σ)·u + b·e with a growing at |f| per metre, and the line's direction
 * P/|P| integrates to u·(|P₁| − |P₀|)/|f| + e·(b/|f|)·(asinh(a₁/|b|) − asinh(a₀/|b|)), the
 * catenary's integrals (Irvine, Cable Structures) about the load's direction.
 */
function straightLoadPiece(h0: number, v0: number, h1: number, v1: number, lengthM: number): void {
  const fx = (h1 - h0) / lengthM,
    fz = (v1 - v0) / lengthM;
  const load = Math.hypot(fx, fz);
  const t0 = Math.hypot(h0, v0);
  if (!(load > 0) || !(lengthM > 0)) {
    sX = t0 > 0 ? (-lengthM * h0) / t0 : 0;
    sZ = t0 > 0 ? (-lengthM * v0) / t0 : -lengthM;
    return;
  }
  const ux = fx / load,
    uz = fz / load;
  const ex = -uz,
    ez = ux;
  const a0 = h0 * ux + v0 * uz,
    a1 = h1 * ux + v1 * uz;
  const b = h0 * ex + v0 * ez;
  const along = (Math.hypot(h1, v1) - t0) / load;
  // Sideways tension this small bends the piece by b·ln(1/b) → 0, below rounding: none at all.
  const across =
    Math.abs(b) <= 1e-12 * (t0 + Math.hypot(h1, v1)) ? 0 : (b / load) * (Math.asinh(a1 / Math.abs(b)) - Math.asinh(a0 / Math.abs(b)));
  // The line runs against its tension going down: the displacement is minus the integral.
  sX = -(along * ux + across * ex);
  sZ = -(along * uz + across * ez);
}

/**
 * The line's shape for the lifter's pull, with the tether point `topHeightM` above the ground for
 * the wind at each height. Pushes the line's points (relative to the tether point) into `points`
 * when given. The pull must have upN > 0 (a lifter that flies). `steps` trades accuracy for time.
 */
export function integrateLine(
  line: LineSpec,
  pull: LinePull,
  profile: WindProfile,
  topHeightM: number,
  points: Vec[] | null = null,
  steps: number = LINE_STEPS,
): LineSolution {
  const drag = line.normalDragAreaPerMetreM > 0 || line.skinFrictionAreaPerMetreM > 0;
  const loads: Loads = {
    w: line.weightPerMetreN,
    normal: line.normalDragAreaPerMetreM,
    along: line.skinFrictionAreaPerMetreM,
    halfRho: 0.5 * line.airDensityKgM3,
    windMS: profile.referenceMS,
    referenceHeightM: profile.referenceHeightM,
    exponent: profile.exponent,
    topHeightM,
    drag,
  };
  let h = pull.downwindN,
    v = pull.upN,
    x = 0,
    z = 0;
  let wind = drag ? windAt(loads, 0) : 0;
  points?.push({ x: 0, z: 0 });
  const ds = line.lengthM / steps;
  let hungM = line.lengthM;
  const small = 1e-12 * (Math.abs(pull.upN) + Math.abs(pull.downwindN));
  for (let step = 0; step < steps && ds > 0; step++) {
    rk4Step(loads, h, v, x, z, wind, ds);
    if (sV <= 0) {
      // The line meets the ground inside this step: find where V = 0 by regula falsi on the
      // step's length (V is close to linear over one step), then stop there.
      let lowDs = 0,
        lowV = v,
        highDs = ds,
        highV = sV;
      for (let i = 0; i < 4 && highV !== lowV; i++) {
        const tryDs = lowDs + ((highDs - lowDs) * lowV) / (lowV - highV);
        rk4Step(loads, h, v, x, z, wind, tryDs);
        if (sV > 0) {
          lowDs = tryDs;
          lowV = sV;
        } else {
          highDs = tryDs;
          highV = sV;
        }
        if (Math.abs(sV) <= small) break;
      }
      const touchDs = Math.abs(lowV) <= Math.abs(highV) ? lowDs : highDs;
      rk4Step(loads, h, v, x, z, wind, touchDs);
      // The line turns sharply where it meets the ground when little pulls it sideways (its
      // bend radius there is H/w), too sharply for the stages of a step. Over this last piece the
      // load is taken as constant (the step's mean), which makes the piece a catenary about the
      // load's direction, integrated exactly: the tension at both ends is RK4's.
      straightLoadPiece(h, v, sH, 0, touchDs);
      h = sH;
      v = 0;
      x += sX;
      z += sZ;
      hungM = step * ds + touchDs;
      break;
    }
    h = sH;
    v = sV;
    x = sX;
    z = sZ;
    wind = sWind;
    points?.push({ x, z });
  }
  const onGroundM = Math.max(0, line.lengthM - hungM);
  const anchorDownwindN = h;
  const anchorUpN = v;
  // On the ground the line runs straight upwind to the anchor when something pulls it downwind.
  const laidOutM = onGroundM > 0 && anchorDownwindN > 0 ? onGroundM : 0;
  if (onGroundM > 0 && points) {
    points.push({ x, z });
    if (laidOutM > 0) points.push({ x: x - laidOutM, z });
  }
  return {
    heightAboveGroundM: Math.max(0, -z),
    blowdownM: Math.max(0, -x + laidOutM),
    anchorAngleDeg: onGroundM > 0 ? (anchorDownwindN > 0 ? 90 : 0) : radiansToDegrees(Math.atan2(anchorDownwindN, anchorUpN)),
    anchorTensionN: Math.hypot(anchorDownwindN, anchorUpN),
    lengthOnGroundM: onGroundM,
    anchorDownwindN,
    anchorUpN,
  };
}
