/**
 * evaluateBalance: one setup in, its balance report out. Pure and allocation-light, because the
 * planner calls it on every drag of the mount and the server stores its result with a setup.
 * Inputs are assumed to have passed balanceInputSchema; then it never throws and every number
 * in the result is finite.
 */
import { siteAir } from "./atmosphere";
import { attachmentFlags } from "./attachment";
import { hullClearanceM, tetherClearanceM } from "./clearance";
import { figure, findingsByPayload, makeFlag, resolveLimits, type AirCase, type Flag, type Limits } from "./flags";
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

const SECONDS_PER_DAY = 86_400;

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
  // Without free lift there is no calm trim, but the free-lift flag already says it does not fly.
  if (calm.reason === "no-free-lift") return;
  if (calm.trimRad === null) {
    out.push(makeFlag("trim-unstable", "stop", { figures: {}, params: {} }));
    return;
  }
  const trim = figure("angle", calm.trimRad, degreesToRadians(limits.cautionTrimDeg));
  out.push(makeFlag("trim-calm", Math.abs(calm.trimDeg) > limits.cautionTrimDeg ? "caution" : "ok", { figures: { trim }, params: {} }));
}

function windFlags(outcome: WindOutcome, speedMS: number, airCase: "wind" | "gust", limits: Limits, out: Flag[]): void {
  const trimCode = airCase === "wind" ? "trim-wind" : "trim-gust";
  const angleCode = airCase === "wind" ? "tether-angle-wind" : "tether-angle-gust";
  const speed = figure("speed", speedMS);
  const c = outcome.case;
  if (!c) {
    const failure = outcome.reason === "cannot-fly" ? "cannot-fly" : "no-equilibrium";
    out.push(makeFlag(trimCode, "stop", { figures: { speed }, params: { case: airCase, failure } }));
    return;
  }
  const trimSize = Math.abs(c.trimDeg);
  const trimLevel = trimSize > limits.stopTrimDeg ? "stop" : trimSize > limits.cautionTrimDeg ? "caution" : "ok";
  const trimLimitDeg = trimLevel === "stop" ? limits.stopTrimDeg : limits.cautionTrimDeg;
  out.push(makeFlag(trimCode, trimLevel, {
    figures: { speed, trim: figure("angle", degreesToRadians(c.trimDeg), degreesToRadians(trimLimitDeg)) },
    params: { case: airCase },
  }));
  const angleLevel = c.tetherAngleDeg > limits.stopTetherAngleDeg ? "stop"
    : c.tetherAngleDeg > limits.cautionTetherAngleDeg ? "caution" : "ok";
  const angleLimitDeg = angleLevel === "stop" ? limits.stopTetherAngleDeg : limits.cautionTetherAngleDeg;
  out.push(makeFlag(angleCode, angleLevel, {
    figures: { speed, angle: figure("angle", degreesToRadians(c.tetherAngleDeg), degreesToRadians(angleLimitDeg)) },
    params: { case: airCase },
  }));
}

function freeLiftFlag(freeLiftKg: number, freeLiftRatio: number, limits: Limits): Flag {
  const freeLift = figure("mass", freeLiftKg);
  if (!(freeLiftKg > 0)) return makeFlag("free-lift", "stop", { figures: { freeLift }, params: {} });
  const ratio = figure("ratio", freeLiftRatio, limits.cautionFreeLiftRatio);
  return makeFlag("free-lift", freeLiftRatio < limits.cautionFreeLiftRatio ? "caution" : "ok", { figures: { freeLift, ratio }, params: {} });
}

function railFlag(positionX: number, rail: Input["envelope"]["rail"]): Flag {
  const railStart = figure("smallLength", rail.startX);
  const railEnd = figure("smallLength", rail.endX);
  const passed = positionX < rail.startX ? rail.startX : positionX > rail.endX ? rail.endX : null;
  return passed === null
    ? makeFlag("mount-off-rail", "ok", { figures: { position: figure("smallLength", positionX), railStart, railEnd }, params: {} })
    : makeFlag("mount-off-rail", "stop", { figures: { position: figure("smallLength", positionX, passed), railStart, railEnd }, params: {} });
}

type GapLevel = "ok" | "caution" | "stop";

/** Clearance at the wind case (calm when there is no wind); the tether check only when it flies. */
function clearanceFlags(input: Input, centres: readonly Vec[], flying: WindCase | null, limits: Limits, out: Flag[]): void {
  const { envelope, payloads } = input;
  const hull = envelope.hull;
  const lineLengthM = input.tether?.lengthOutM ?? 100;
  const windMS = input.site?.windMS ?? 0;
  const level = (gapM: number, touching: boolean): GapLevel =>
    touching ? "stop" : gapM < limits.clearanceCautionM ? "caution" : "ok";
  // Identical payloads at the same place have the same gap: one flag names them all.
  const hullGaps = findingsByPayload<{ gapM: number; level: GapLevel }>();
  const lineGaps = findingsByPayload<{ gapM: number; level: GapLevel }>();
  for (let i = 0; i < payloads.length; i++) {
    const ref = { index: i, name: payloads[i].name };
    const size = payloads[i].size;
    if (hull) {
      const gapM = hullClearanceM(hull, centres[i], size);
      const gapLevel = level(gapM, gapM < 0);
      hullGaps.add(`${gapLevel}|${gapM}`, ref, { gapM, level: gapLevel });
    }
    if (flying) {
      const lineAngleRad = degreesToRadians(flying.tetherAngleDeg + flying.trimDeg);
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

/** The largest tether tension of the calm, wind and gust cases, and which case it is. */
function largestTension(freeLiftKg: number, wind: WindCase | null, gust: WindCase | null): { tensionN: number; case: AirCase } {
  let largest: { tensionN: number; case: AirCase } = { tensionN: Math.max(0, freeLiftKg) * STANDARD_GRAVITY_MS2, case: "calm" };
  if (wind && wind.speedMS > 0 && wind.tensionN > largest.tensionN) largest = { tensionN: wind.tensionN, case: "wind" };
  if (gust && gust.speedMS > 0 && gust.tensionN > largest.tensionN) largest = { tensionN: gust.tensionN, case: "gust" };
  return largest;
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
  flags.push(freeLiftFlag(freeLiftKg, freeLiftRatio, limits));
  flags.push(railFlag(mount.positionX, envelope.rail));

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

  clearanceFlags(input, payloadCentres, windOutcome.case, limits, flags);

  let maxOutM: number | null = null;
  if (input.tether) {
    maxOutM = maxTetherOutM(freeLiftKg, input.tether.massPerMetreKg);
    const tension = largestTension(freeLiftKg, windOutcome.case, gustOutcome?.case ?? null);
    tetherFlags(input.tether, grossLiftKg, freeLiftKg, tension, limits, flags);
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
    flags.push(makeFlag("helium-top-up", "ok", {
      figures: {
        topUpAfter: figure("duration", helium.daysToTopUp * SECONDS_PER_DAY),
        lossPerDay: figure("ratio", helium.lossPerDayFraction),
        freeLiftRatio: figure("ratio", freeLiftRatio, limits.cautionFreeLiftRatio),
      },
      params: {},
    }));
  }

  rulesFlags(envelope.gasVolumeM3, envelope.hull ? envelope.hull.maxDiameterM : null, input.tether?.lengthOutM ?? null, flags);

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
