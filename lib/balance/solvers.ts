/**
 * Solvers (design.md item 11).
 *  - Level (or target) trim: in the calm formula only W·g_x depends on the mount's position, and
 *    linearly (d(W·g_x)/dx = g0 · mass that moves with the mount), so the position is exact:
 *    B·b_x − W·g_x = tan(θ_target)·(W·g_z − B·b_z).
 *  - Largest payload mass: scan, then bisect, for the largest extra mass with no `stop` flag.
 */
import { evaluateBalance } from "./evaluate";
import type { FlagCode } from "./flags";
import { grossLiftKg as grossLift, liftGasDensityKgM3 } from "./gas";
import { siteAir } from "./atmosphere";
import { setupMass } from "./mass";
import type { BalanceInput, DeepReadonly } from "./schema";
import { calmStiffnessNm, calmTrim, pitchStatics } from "./trim";
import { STANDARD_GRAVITY_MS2, degreesToRadians } from "./units-si";

type Input = DeepReadonly<BalanceInput>;

/** Why no mount position gives the target trim. */
export type LevelTrimFailure = "no-free-lift" | "unstable" | "nothing-moves";

export type LevelTrimSolution =
  /** The mount position giving the target calm trim (it may lie off the rail: see withinRail). */
  | { readonly positionX: number; readonly trimDeg: number; readonly withinRail: boolean; readonly reason: null }
  | { readonly positionX: null; readonly trimDeg: null; readonly withinRail: false; readonly reason: LevelTrimFailure };

function withMountAt(input: Input, positionX: number): Input {
  return { ...input, mount: { ...input.mount, positionX } };
}

const noSolution = (reason: LevelTrimFailure): LevelTrimSolution => ({ positionX: null, trimDeg: null, withinRail: false, reason });

/** No position when there is no free lift, no stable trim, or nothing moves with the mount. */
export function solveLevelTrimPositionX(input: Input, targetTrimDeg: number = 0): LevelTrimSolution {
  const air = siteAir(input.site);
  const gasDensity = liftGasDensityKgM3(air.pressurePa, air.temperatureK + (input.gas?.superheatK ?? 0), input.gas?.purity ?? 1);
  const gross = grossLift(input.envelope.gasVolumeM3, input.gas?.fillFraction ?? 1, air.densityKgM3, gasDensity);
  const mass = setupMass(input);
  if (!(gross - mass.totalMassKg > 0)) return noSolution("no-free-lift");
  const movingKg = input.mount.massKg + mass.hangingMassKg;
  if (!(movingKg > 0)) return noSolution("nothing-moves");
  const statics = pitchStatics(gross, mass.totalMassKg, input.envelope.buoyancyCentre, mass.centreOfMass, input.envelope.tetherPoint);
  const stiffness = calmStiffnessNm(statics);
  // The stiffness does not depend on the mount's x, so no position can make it stable.
  if (!(stiffness < 0)) return noSolution("unstable");
  const wantedWeightArm = statics.buoyancyN * statics.bx - Math.tan(degreesToRadians(targetTrimDeg)) * stiffness;
  const shiftM = (wantedWeightArm - statics.weightN * statics.gx) / (STANDARD_GRAVITY_MS2 * movingKg);
  const positionX = input.mount.positionX + shiftM;
  if (!Number.isFinite(positionX)) return noSolution("nothing-moves");
  const moved = withMountAt(input, positionX);
  const movedMass = setupMass(moved);
  const trim = calmTrim(
    pitchStatics(gross, movedMass.totalMassKg, input.envelope.buoyancyCentre, movedMass.centreOfMass, input.envelope.tetherPoint),
    gross - movedMass.totalMassKg,
  );
  if (trim.trimDeg === null) return noSolution(trim.reason);
  const rail = input.envelope.rail;
  return { positionX, trimDeg: trim.trimDeg, withinRail: positionX >= rail.startX && positionX <= rail.endX, reason: null };
}

export interface MaxPayloadOptions {
  /** Grow this payload's mass; without it, a point mass is added at the mount's attachment point. */
  readonly payloadIndex?: number;
  /** Slide the mount (within the rail) to level trim for every candidate mass. */
  readonly retrim?: boolean;
}

export interface MaxPayloadSolution {
  /** Largest extra mass with no `stop` flag, kg; null when the setup already has a stop at zero. */
  readonly extraMassKg: number | null;
  /** The stop that limits it (at just above the largest mass, or at zero). */
  readonly limitingCode: FlagCode | null;
  /** Mount position used at the largest mass. */
  readonly positionX: number;
}

function withExtraMass(input: Input, extraKg: number, options: MaxPayloadOptions): Input {
  const index = options.payloadIndex;
  const payloads =
    index !== undefined && index >= 0 && index < input.payloads.length
      ? input.payloads.map((p, i) => (i === index ? { ...p, massKg: p.massKg + extraKg } : p))
      : [
          ...input.payloads,
          {
            name: "extra payload",
            massKg: extraKg,
            offset: { x: 0, z: 0 },
            attachment: input.mount.thread,
          },
        ];
  const loaded: Input = { ...input, payloads };
  if (!options.retrim) return loaded;
  const level = solveLevelTrimPositionX(loaded);
  if (level.positionX === null) return loaded;
  const rail = input.envelope.rail;
  return withMountAt(loaded, Math.min(rail.endX, Math.max(rail.startX, level.positionX)));
}

function firstStop(input: Input): FlagCode | null {
  for (const flag of evaluateBalance(input).flags) if (flag.level === "stop") return flag.code;
  return null;
}

const SCAN_STEPS = 40;
const BISECTIONS = 40;

export function solveMaxPayloadMassKg(input: Input, options: MaxPayloadOptions = {}): MaxPayloadSolution {
  const atZero = withExtraMass(input, 0, options);
  const zeroStop = firstStop(atZero);
  if (zeroStop) return { extraMassKg: null, limitingCode: zeroStop, positionX: atZero.mount.positionX };
  const gross = evaluateBalance(atZero).grossLiftKg;
  const upperKg = Math.max(0, gross) + 1; // beyond this the free lift is surely gone
  let low = 0;
  let high = upperKg;
  let highStop: FlagCode | null = null;
  for (let step = 1; step <= SCAN_STEPS; step++) {
    const candidate = (upperKg * step) / SCAN_STEPS;
    const stop = firstStop(withExtraMass(input, candidate, options));
    if (stop) {
      high = candidate;
      highStop = stop;
      break;
    }
    low = candidate;
  }
  for (let i = 0; i < BISECTIONS && highStop; i++) {
    const middle = 0.5 * (low + high);
    const stop = firstStop(withExtraMass(input, middle, options));
    if (stop) {
      high = middle;
      highStop = stop;
    } else {
      low = middle;
    }
  }
  return { extraMassKg: low, limitingCode: highStop, positionX: withExtraMass(input, low, options).mount.positionX };
}
