/**
 * The lifter and its line together (design.md item 11): the lifter flies in the wind at its own
 * height, and that height comes from the line's shape, which hangs in the wind at each height
 * along it. So height and wind are solved together, as a fixed point h = g(h): at a guess h the
 * lifter's trim and pull are solved in the wind at h (wind.ts), the line is integrated from that
 * pull down to the anchor in the wind profile with the tether point at h (tether-line.ts), and the
 * line gives the height g(h). The wind changes slowly with height (as h^α, α ≈ 1/7), so g is a
 * strong contraction; the secant method on g(h) − h reaches the fixed point in a few steps.
 * The search integrates the line coarsely (its error is far below what moves the wind at the
 * lifter), then the line is integrated once in full at the height found.
 * With α = 0 (the same wind at every height), or no wind at all, a single pass is exact.
 */
import { LINE_STEPS, integrateLine, type LineSolution, type LineSpec } from "./tether-line";
import type { CalmTrim } from "./trim";
import { degreesToRadians } from "./units-si";
import type { Vec } from "./vec";
import { solveWindCase, type WindCase, type WindModel, type WindOutcome } from "./wind";
import { windAtHeightMS, type WindProfile } from "./wind-profile";

export interface FlightSpec {
  readonly model: WindModel;
  readonly airDensityKgM3: number;
  readonly profile: WindProfile;
  readonly calm: CalmTrim;
  /** The tether line; null without a tether (then the lifter flies in the wind as measured). */
  readonly line: LineSpec | null;
}

const MAX_ITERATIONS = 12;
/** Steps of the line while searching for the height: within a few centimetres per 100 m of line. */
const SEARCH_STEPS = 6;

/** The lifter's pull on the line in a case: its drag downwind, its net lift up. */
function pullOf(model: WindModel, c: WindCase): { downwindN: number; upN: number } {
  return { downwindN: c.dragN, upN: model.statics.buoyancyN - model.statics.weightN + c.liftN };
}

interface Step {
  readonly outcome: WindOutcome;
  readonly line: LineSolution | null;
}

export function solveFlight(spec: FlightSpec): WindOutcome {
  const { model, airDensityKgM3, profile, calm, line } = spec;
  const first = solveWindCase(model, airDensityKgM3, profile.referenceMS, calm);
  if (!line || !first.case) return first;

  let previousTrimRad = degreesToRadians(first.case.trimDeg);
  const at = (heightM: number, steps: number): Step => {
    const windMS = windAtHeightMS(profile, heightM);
    const outcome =
      windMS === profile.referenceMS ? first : solveWindCase(model, airDensityKgM3, windMS, calm, windMS > 0 ? previousTrimRad : null);
    if (!outcome.case) return { outcome, line: null };
    previousTrimRad = degreesToRadians(outcome.case.trimDeg);
    return { outcome, line: integrateLine(line, pullOf(model, outcome.case), profile, heightM, null, steps) };
  };

  // Start from the straight line at the lifter's angle in the measured wind.
  let heightB = line.lengthM * Math.cos(degreesToRadians(first.case.tetherAngleDeg));
  if (profile.exponent === 0 || profile.referenceMS === 0) return withLine(at(heightB, LINE_STEPS), profile);
  let step = at(heightB, SEARCH_STEPS);
  if (!step.line) return step.outcome;
  let heightA = heightB;
  let residualA = step.line.heightAboveGroundM - heightA;
  heightB = step.line.heightAboveGroundM;
  const toleranceM = 1e-6 * Math.max(1, line.lengthM);
  for (let i = 0; i < MAX_ITERATIONS && Math.abs(residualA) > toleranceM; i++) {
    step = at(heightB, SEARCH_STEPS);
    if (!step.line) return step.outcome;
    const residualB = step.line.heightAboveGroundM - heightB;
    if (Math.abs(residualB) <= toleranceM) break;
    const slope = (residualB - residualA) / (heightB - heightA);
    // Secant step; a flat or wild slope falls back to plain iteration (g is a contraction).
    let next = slope < 0 && Number.isFinite(slope) ? heightB - residualB / slope : step.line.heightAboveGroundM;
    next = Math.min(line.lengthM, Math.max(0, next));
    // A secant step well inside the last one shows g is as good as linear here: it lands on the
    // fixed point (the error goes as the product of the two residuals), so stop there.
    const done = Math.abs(next - heightB) <= Math.max(toleranceM, 0.02 * Math.abs(heightB - heightA));
    heightA = heightB;
    residualA = residualB;
    heightB = next;
    if (done) break;
  }
  return withLine(at(heightB, LINE_STEPS), profile);
}

function withLine(step: Step, profile: WindProfile): WindOutcome {
  const c = step.outcome.case;
  if (!c || !step.line) return step.outcome;
  const { heightAboveGroundM, blowdownM, anchorAngleDeg, anchorTensionN, lengthOnGroundM } = step.line;
  return {
    case: {
      ...c,
      speedMS: profile.referenceMS,
      line: { heightAboveGroundM, blowdownM, anchorAngleDeg, anchorTensionN, lengthOnGroundM },
    },
    reason: null,
  };
}

/**
 * The line's points for a solved case, for drawing: relative to the tether point, x downwind and
 * z up, from the tether point down to the anchor. The same integration as the case's own.
 */
export function flightLinePoints(spec: FlightSpec, c: WindCase): Vec[] {
  if (!spec.line || !c.line) return [];
  const points: Vec[] = [];
  integrateLine(spec.line, pullOf(spec.model, c), spec.profile, c.line.heightAboveGroundM, points);
  return points;
}
