/**
 * evaluateBalance: one setup in, its balance report out. Pure and allocation-light, because the
 * planner calls it on every drag of the mount and the server stores its result with a setup.
 * Inputs are assumed to have passed balanceInputSchema; then it never throws and every number
 * in the result is finite.
 */
import { siteAir } from "./atmosphere";
import { attachmentFlags } from "./attachment";
import { hullClearanceM, tetherClearanceM } from "./clearance";
import { fixed, makeFlag, percent, resolveLimits, type Flag, type Limits } from "./flags";
import { grossLiftKg as grossLift, liftGasDensityKgM3 } from "./gas";
import { DEFAULT_CYLINDER_CONTENT_M3, DEFAULT_LOSS_PER_DAY_FRACTION, heliumBudget, type HeliumBudget } from "./helium";
import { payloadCentre, setupMass } from "./mass";
import type { BalanceInput, DeepReadonly } from "./schema";
import { rulesFlags } from "./rules";
import { maxTetherOutM, tetherFlags } from "./tether";
import { calmTrim, pitchStatics, type CalmTrim } from "./trim";
import { STANDARD_GRAVITY_MS2, degreesToRadians } from "./units-si";
import type { Vec } from "./vec";
import { solveWindCase, type WindCase, type WindModel, type WindOutcome } from "./wind";

/** The wind or gust case as the report gives it: the solver's own result. */
export type WindSummary = WindCase;

export interface BalanceResult {
  readonly airDensityKgM3: number;
  readonly gasDensityKgM3: number;
  readonly airTemperatureK: number;
  readonly airPressurePa: number;
  /** fillFraction · gasVolumeM3 · (ρ_air − ρ_gas) */
  readonly grossLiftKg: number;
  /** envelope + mount + adapters + payloads (not the tether) */
  readonly totalMassKg: number;
  /** grossLiftKg − totalMassKg */
  readonly freeLiftKg: number;
  /** freeLiftKg / grossLiftKg; −1 when there is no gross lift at all. */
  readonly freeLiftRatio: number;
  /** of everything in totalMassKg */
  readonly centreOfMass: Vec;
  /** Nose up positive; null when it cannot fly or has no stable trim. */
  readonly calmTrimDeg: number | null;
  readonly wind: WindSummary | null;
  readonly gust: WindSummary | null;
  readonly maxTetherOutM: number | null;
  readonly helium: HeliumBudget;
  /** Each payload's centre of mass in the body frame, in input order. */
  readonly payloadCentres: readonly Vec[];
  readonly flags: readonly Flag[];
}

type Input = DeepReadonly<BalanceInput>;

/** Drag area of a payload without a measured one: a box's front face × 1.05 (cube, Hoerner's
 *  Fluid-Dynamic Drag, from memory). */
export function payloadDragAreaM2(payload: Input["payloads"][number]): number {
  if (payload.dragAreaM2 !== undefined) return payload.dragAreaM2;
  return payload.size ? 1.05 * payload.size.widthM * payload.size.heightM : 0;
}

export function buildWindModel(input: Input, statics: WindModel["statics"], centres: readonly Vec[]): WindModel {
  const aero = input.envelope.aero;
  const tether = input.envelope.tetherPoint;
  const payloadDrag = new Float64Array(3 * input.payloads.length);
  for (let i = 0; i < input.payloads.length; i++) {
    payloadDrag[3 * i] = payloadDragAreaM2(input.payloads[i]);
    payloadDrag[3 * i + 1] = centres[i].x - tether.x;
    payloadDrag[3 * i + 2] = centres[i].z - tether.z;
  }
  return {
    statics,
    sailAreaM2: aero?.sailAreaM2 ?? 0,
    liftSlopePerRad: aero?.liftSlopePerRad ?? 0,
    zeroLiftTrimRad: degreesToRadians(aero?.zeroLiftTrimDeg ?? 0),
    dragCoefficient: aero?.dragCoefficient ?? 0,
    cx: (aero?.pressureCentre.x ?? tether.x) - tether.x,
    cz: (aero?.pressureCentre.z ?? tether.z) - tether.z,
    payloadDrag,
  };
}

function calmFlags(calm: CalmTrim, limits: Limits, out: Flag[]): void {
  if (calm.trimDeg === null) {
    if (calm.reason === "no-free-lift") {
      out.push(makeFlag("trim-calm", "stop", "No calm trim: without free lift the lifter does not fly."));
      return;
    }
    out.push(makeFlag("trim-unstable", "stop",
      "No stable trim: the centre of mass is too high against the centre of buoyancy for this " +
      "tether point; the lifter would roll over. Lower the payload or the tether point."));
  } else {
    const size = Math.abs(calm.trimDeg);
    const text = `Calm trim is ${fixed(calm.trimDeg, 1)}° (nose up positive)`;
    out.push(size > limits.cautionTrimDeg
      ? makeFlag("trim-calm", "caution", `${text}; caution beyond ±${fixed(limits.cautionTrimDeg, 0)}°. Slide the mount ${calm.trimDeg > 0 ? "forward" : "aft"}.`, calm.trimDeg, limits.cautionTrimDeg)
      : makeFlag("trim-calm", "ok", `${text}, within ±${fixed(limits.cautionTrimDeg, 0)}°.`, calm.trimDeg, limits.cautionTrimDeg));
  }
}

function windFlags(outcome: WindOutcome, speedMS: number, kind: "wind" | "gust", limits: Limits, out: Flag[]): void {
  const trimCode = kind === "wind" ? "trim-wind" : "trim-gust";
  const angleCode = kind === "wind" ? "tether-angle-wind" : "tether-angle-gust";
  const at = `in ${kind === "wind" ? "wind" : "gusts"} of ${fixed(speedMS, 1)} m/s`;
  const c = outcome.case;
  if (!c) {
    out.push(makeFlag(trimCode, "stop", outcome.reason === "cannot-fly"
      ? `It cannot fly ${at}: drag and weight beat lift.`
      : `No stable trim ${at}.`, speedMS));
    return;
  }
  const size = Math.abs(c.trimDeg);
  const trimText = `Trim ${at} is ${fixed(c.trimDeg, 1)}°`;
  out.push(size > limits.stopTrimDeg
    ? makeFlag(trimCode, "stop", `${trimText}; stop beyond ±${fixed(limits.stopTrimDeg, 0)}°.`, c.trimDeg, limits.stopTrimDeg)
    : size > limits.cautionTrimDeg
      ? makeFlag(trimCode, "caution", `${trimText}; caution beyond ±${fixed(limits.cautionTrimDeg, 0)}°.`, c.trimDeg, limits.cautionTrimDeg)
      : makeFlag(trimCode, "ok", `${trimText}, within ±${fixed(limits.cautionTrimDeg, 0)}°.`, c.trimDeg, limits.cautionTrimDeg));
  const angleText = `Tether angle ${at} is ${fixed(c.tetherAngleDeg, 1)}° from vertical`;
  out.push(c.tetherAngleDeg > limits.stopTetherAngleDeg
    ? makeFlag(angleCode, "stop", `${angleText}; stop beyond ${fixed(limits.stopTetherAngleDeg, 0)}°.`, c.tetherAngleDeg, limits.stopTetherAngleDeg)
    : c.tetherAngleDeg > limits.cautionTetherAngleDeg
      ? makeFlag(angleCode, "caution", `${angleText}; caution beyond ${fixed(limits.cautionTetherAngleDeg, 0)}°.`, c.tetherAngleDeg, limits.cautionTetherAngleDeg)
      : makeFlag(angleCode, "ok", `${angleText}, within ${fixed(limits.cautionTetherAngleDeg, 0)}°.`, c.tetherAngleDeg, limits.cautionTetherAngleDeg));
}

export function evaluateBalance(input: Input): BalanceResult {
  const { envelope, mount, payloads } = input;
  const limits = resolveLimits(envelope.limits);
  const flags: Flag[] = [];

  const air = siteAir(input.site);
  const gasTemperatureK = air.temperatureK + (input.gas?.superheatK ?? 0);
  const purity = input.gas?.purity ?? 1;
  const fillFraction = input.gas?.fillFraction ?? 1;
  const gasDensityKgM3 = liftGasDensityKgM3(air.pressurePa, gasTemperatureK, purity);
  const grossLiftKg = grossLift(envelope.gasVolumeM3, fillFraction, air.densityKgM3, gasDensityKgM3);

  const mass = setupMass(input);
  const freeLiftKg = grossLiftKg - mass.totalMassKg;
  const rawRatio = freeLiftKg / grossLiftKg;
  const freeLiftRatio = grossLiftKg > 0 && Number.isFinite(rawRatio) ? rawRatio : -1;
  const freeText = `Free lift is ${fixed(freeLiftKg, 3)} kg, ${percent(Math.max(-9.99, freeLiftRatio))} of gross lift`;
  flags.push(!(freeLiftKg > 0)
    ? makeFlag("free-lift", "stop", `${freeText}: it does not fly.`, freeLiftRatio, 0)
    : freeLiftRatio < limits.cautionFreeLiftRatio
      ? makeFlag("free-lift", "caution", `${freeText}; caution below ${percent(limits.cautionFreeLiftRatio)}.`, freeLiftRatio, limits.cautionFreeLiftRatio)
      : makeFlag("free-lift", "ok", `${freeText}; caution below ${percent(limits.cautionFreeLiftRatio)}.`, freeLiftRatio, limits.cautionFreeLiftRatio));

  const rail = envelope.rail;
  flags.push(mount.positionX < rail.startX || mount.positionX > rail.endX
    ? makeFlag("mount-off-rail", "stop",
      `The mount at x = ${fixed(mount.positionX, 3)} m is off the rail (${fixed(rail.startX, 3)}–${fixed(rail.endX, 3)} m).`,
      mount.positionX, mount.positionX < rail.startX ? rail.startX : rail.endX)
    : makeFlag("mount-off-rail", "ok",
      `The mount at x = ${fixed(mount.positionX, 3)} m is on the rail (${fixed(rail.startX, 3)}–${fixed(rail.endX, 3)} m).`,
      mount.positionX));

  const statics = pitchStatics(grossLiftKg, mass.totalMassKg, envelope.buoyancyCentre, mass.centreOfMass, envelope.tetherPoint);
  const calm = calmTrim(statics, freeLiftKg);
  calmFlags(calm, limits, flags);

  const payloadCentres: Vec[] = [];
  for (let i = 0; i < payloads.length; i++) payloadCentres.push(payloadCentre(input, i));
  const model = buildWindModel(input, statics, payloadCentres);
  const windMS = input.site?.windMS ?? 0;
  const windOutcome = solveWindCase(model, air.densityKgM3, windMS, calm);
  if (windMS > 0) windFlags(windOutcome, windMS, "wind", limits, flags);
  const gustMS = input.site?.gustMS;
  const gustOutcome = gustMS === undefined ? null : solveWindCase(model, air.densityKgM3, gustMS, calm);
  if (gustOutcome && gustMS !== undefined && gustMS > 0) windFlags(gustOutcome, gustMS, "gust", limits, flags);

  attachmentFlags(input, mass.hangingMassKg, limits, flags);

  // Clearance at the wind case (calm when there is no wind); skipped when it cannot fly.
  const flying = windOutcome.case;
  const hull = envelope.hull;
  const lineLengthM = input.tether?.lengthOutM ?? 100;
  for (let i = 0; i < payloads.length; i++) {
    const size = payloads[i].size;
    const name = payloads[i].name;
    if (hull) {
      const gapM = hullClearanceM(hull, payloadCentres[i], size);
      const text = `${name} clears the hull by ${fixed(gapM, 3)} m`;
      flags.push(gapM < 0
        ? makeFlag("clearance-hull", "stop", `${name} cuts into the hull (by ${fixed(-gapM, 3)} m).`, gapM, 0, i)
        : gapM < limits.clearanceCautionM
          ? makeFlag("clearance-hull", "caution", `${text}; caution below ${fixed(limits.clearanceCautionM, 3)} m.`, gapM, limits.clearanceCautionM, i)
          : makeFlag("clearance-hull", "ok", `${text}.`, gapM, limits.clearanceCautionM, i));
    }
    if (flying) {
      const lineAngleRad = degreesToRadians(flying.tetherAngleDeg + flying.trimDeg);
      const gapM = tetherClearanceM(envelope.tetherPoint, lineAngleRad, lineLengthM, payloadCentres[i], size);
      const text = `${name} clears the tether by ${fixed(gapM, 3)} m at ${fixed(windMS, 1)} m/s`;
      flags.push(gapM <= 0
        ? makeFlag("clearance-tether", "stop", `${name} touches the tether at ${fixed(windMS, 1)} m/s.`, gapM, 0, i)
        : gapM < limits.clearanceCautionM
          ? makeFlag("clearance-tether", "caution", `${text}; caution below ${fixed(limits.clearanceCautionM, 3)} m.`, gapM, limits.clearanceCautionM, i)
          : makeFlag("clearance-tether", "ok", `${text}.`, gapM, limits.clearanceCautionM, i));
    }
  }

  let maxOutM: number | null = null;
  if (input.tether) {
    maxOutM = maxTetherOutM(freeLiftKg, input.tether.massPerMetreKg);
    const calmTensionN = Math.max(0, freeLiftKg) * STANDARD_GRAVITY_MS2;
    const largestTensionN = Math.max(calmTensionN, windOutcome.case?.tensionN ?? 0, gustOutcome?.case?.tensionN ?? 0);
    tetherFlags(input.tether, grossLiftKg, freeLiftKg, largestTensionN, limits, flags);
  }

  const helium = heliumBudget({
    gasVolumeM3: envelope.gasVolumeM3,
    fillFraction,
    pressurePa: air.pressurePa,
    gasTemperatureK,
    cylinderContentM3: input.gas?.cylinderContentM3 ?? DEFAULT_CYLINDER_CONTENT_M3,
    lossPerDayFraction: input.gas?.lossPerDayFraction ?? DEFAULT_LOSS_PER_DAY_FRACTION,
    grossLiftKg,
    totalMassKg: mass.totalMassKg,
    cautionFreeLiftRatio: limits.cautionFreeLiftRatio,
  });
  if (helium.daysToTopUp !== null) {
    flags.push(makeFlag("helium-top-up", "ok",
      `Top up after about ${fixed(helium.daysToTopUp, 1)} days (at ${percent(helium.lossPerDayFraction)} loss per day), ` +
      `when free lift falls below ${percent(limits.cautionFreeLiftRatio)} of gross lift.`,
      helium.daysToTopUp * 86_400));
  }

  rulesFlags(envelope.gasVolumeM3, hull ? hull.maxDiameterM : null, input.tether?.lengthOutM ?? null, flags);

  return {
    airDensityKgM3: air.densityKgM3,
    gasDensityKgM3,
    airTemperatureK: air.temperatureK,
    airPressurePa: air.pressurePa,
    grossLiftKg,
    totalMassKg: mass.totalMassKg,
    freeLiftKg,
    freeLiftRatio,
    centreOfMass: mass.centreOfMass,
    calmTrimDeg: calm.trimDeg,
    wind: windOutcome.case,
    gust: gustOutcome ? gustOutcome.case : null,
    maxTetherOutM: maxOutM,
    helium,
    payloadCentres,
    flags,
  };
}
