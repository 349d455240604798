/**
 * evaluateBalance: one setup in, its balance report out. Pure and allocation-light, because the
 * planner calls it on every drag of the mount and the server stores its result with a setup.
 * Inputs are assumed to have passed balanceInputSchema; then it never throws and every number
 * in the result is finite.
 */
import { siteAir } from "./atmosphere";
import { attachmentFlags } from "./attachment";
import { calmFlags, clearanceFlags, freeLiftFlag, largestTension, lineOnGroundFlag, railFlag, windFlags } from "./evaluate-flags";
import { flightLinePoints, solveFlight, type FlightSpec } from "./flight";
import { figure, makeFlag, resolveLimits, type Flag } from "./flags";
import { grossLiftKg as grossLift, liftGasDensityKgM3 } from "./gas";
import { hullSkinAreaM2 } from "./geometry";
import {
  DEFAULT_CYLINDER_CONTENT_M3,
  DEFAULT_LOSS_PER_DAY_FRACTION,
  DEFAULT_PERMEABILITY_L_PER_M2_DAY_ATM,
  heliumBudget,
  permeationLossPerDayFraction,
  type HeliumBudget,
  type LossSource,
} from "./helium";
import { payloadCentre, setupMass } from "./mass";
import type { BalanceInput, DeepReadonly } from "./schema";
import { rulesFlags } from "./rules";
import { lineSpecFor, maxTetherOutM, tetherFlags } from "./tether";
import { calmTrim, pitchStatics } from "./trim";
import { degreesToRadians } from "./units-si";
import type { Vec } from "./vec";
import { inducedDragFactor, type WindCase, type WindModel } from "./wind";
import { windProfile } from "./wind-profile";

const SECONDS_PER_DAY = 86_400;

/** The wind or gust case as the report gives it: the solver's own result, with its line. */
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
    inducedDragFactor: inducedDragFactor(aero?.aspectRatio, aero?.spanEfficiency),
    cx: (aero?.pressureCentre.x ?? tether.x) - tether.x,
    cz: (aero?.pressureCentre.z ?? tether.z) - tether.z,
    payloadDrag,
  };
}

/** Where the day's helium loss comes from: the input's fraction, the fabric's area, or the flat default. */
function heliumLoss(input: Input, gasTemperatureK: number, fillVolumeM3: number): { fraction: number; source: LossSource } {
  const given = input.gas?.lossPerDayFraction;
  if (given !== undefined) return { fraction: given, source: "given" };
  const { envelope } = input;
  const areaM2 = envelope.surfaceAreaM2 ?? (envelope.hull ? hullSkinAreaM2(envelope.hull) : null);
  if (areaM2 === null) return { fraction: DEFAULT_LOSS_PER_DAY_FRACTION, source: "default" };
  const permeability = envelope.permeabilityLPerM2DayAtm ?? DEFAULT_PERMEABILITY_L_PER_M2_DAY_ATM;
  return { fraction: permeationLossPerDayFraction(permeability, areaM2, gasTemperatureK, fillVolumeM3), source: "fabric" };
}

/** What a setup's flags and cases are worked out from: its air, gas, masses and flight specs. */
interface Prepared {
  readonly air: ReturnType<typeof siteAir>;
  readonly gasTemperatureK: number;
  readonly gasDensityKgM3: number;
  readonly grossLiftKg: number;
  readonly mass: ReturnType<typeof setupMass>;
  readonly freeLiftKg: number;
  readonly calm: ReturnType<typeof calmTrim>;
  readonly payloadCentres: Vec[];
  /** The steady wind's flight; the gust's differs only in its reference wind. */
  readonly wind: FlightSpec;
  readonly gust: FlightSpec | null;
}

function prepare(input: Input): Prepared {
  const { envelope } = input;
  const air = siteAir(input.site);
  const gasTemperatureK = air.temperatureK + (input.gas?.superheatK ?? 0);
  const gasDensityKgM3 = liftGasDensityKgM3(air.pressurePa, gasTemperatureK, input.gas?.purity ?? 1);
  const grossLiftKg = grossLift(envelope.gasVolumeM3, input.gas?.fillFraction ?? 1, air.densityKgM3, gasDensityKgM3);
  const mass = setupMass(input);
  const freeLiftKg = grossLiftKg - mass.totalMassKg;
  const statics = pitchStatics(grossLiftKg, mass.totalMassKg, envelope.buoyancyCentre, mass.centreOfMass, envelope.tetherPoint);
  const calm = calmTrim(statics, freeLiftKg);
  const payloadCentres: Vec[] = [];
  for (let i = 0; i < input.payloads.length; i++) payloadCentres.push(payloadCentre(input, i));
  const model = buildWindModel(input, statics, payloadCentres);
  const line = input.tether ? lineSpecFor(input.tether, air.densityKgM3) : null;
  // The lifter flies in the wind at its own height, on its line (flight.ts).
  const wind: FlightSpec = {
    model,
    airDensityKgM3: air.densityKgM3,
    profile: windProfile(input.site?.windMS ?? 0, input.site),
    calm,
    line,
  };
  const gustMS = input.site?.gustMS;
  const gust = gustMS === undefined ? null : { ...wind, profile: windProfile(gustMS, input.site) };
  return { air, gasTemperatureK, gasDensityKgM3, grossLiftKg, mass, freeLiftKg, calm, payloadCentres, wind, gust };
}

/** The wind and gust flight specs of an input (the gust's null without a gust), as evaluateBalance solves them. */
export function setupFlight(input: Input): { readonly wind: FlightSpec; readonly gust: FlightSpec | null } {
  const { wind, gust } = prepare(input);
  return { wind, gust };
}

/**
 * The tether line of the wind or gust case as points to draw: relative to the tether point, x
 * downwind and z up (metres, not pitched with the lifter), from the tether point to the anchor.
 * Empty when the case has no line (no tether, or it does not fly).
 */
export function tetherLinePoints(input: Input, result: BalanceResult, airCase: "wind" | "gust"): Vec[] {
  const c = airCase === "wind" ? result.wind : result.gust;
  const prepared = prepare(input);
  const spec = airCase === "wind" ? prepared.wind : prepared.gust;
  return c && spec ? flightLinePoints(spec, c) : [];
}

export function evaluateBalance(input: Input): BalanceResult {
  const { envelope, mount } = input;
  const limits = resolveLimits(envelope.limits);
  const flags: Flag[] = [];
  const prepared = prepare(input);

  const { air, gasTemperatureK, gasDensityKgM3, grossLiftKg, mass, freeLiftKg, calm, payloadCentres } = prepared;
  const fillFraction = input.gas?.fillFraction ?? 1;
  const rawRatio = freeLiftKg / grossLiftKg;
  const freeLiftRatio = grossLiftKg > 0 && Number.isFinite(rawRatio) ? rawRatio : -1;
  flags.push(freeLiftFlag(freeLiftKg, freeLiftRatio, limits));
  flags.push(railFlag(mount.positionX, envelope.rail));
  calmFlags(calm, limits, flags);

  const windMS = input.site?.windMS ?? 0;
  const windOutcome = solveFlight(prepared.wind);
  if (windMS > 0) windFlags(windOutcome, windMS, "wind", limits, flags);
  const gustMS = input.site?.gustMS;
  const gustOutcome = prepared.gust ? solveFlight(prepared.gust) : null;
  if (gustOutcome && gustMS !== undefined && gustMS > 0) windFlags(gustOutcome, gustMS, "gust", limits, flags);
  const wind = windOutcome.case;
  const gust = gustOutcome?.case ?? null;

  attachmentFlags(input, mass.hangingMassKg, limits, flags);

  clearanceFlags(input, payloadCentres, wind, limits, flags);

  let maxOutM: number | null = null;
  if (input.tether) {
    maxOutM = maxTetherOutM(freeLiftKg, input.tether.massPerMetreKg);
    tetherFlags(input.tether, grossLiftKg, freeLiftKg, largestTension(freeLiftKg, wind, gust), limits, flags);
    lineOnGroundFlag(wind, gust, input.tether.lengthOutM, flags);
  }

  const fillVolumeM3 = fillFraction * envelope.gasVolumeM3;
  const loss = heliumLoss(input, gasTemperatureK, fillVolumeM3);
  const helium = heliumBudget({
    gasVolumeM3: envelope.gasVolumeM3,
    fillFraction,
    pressurePa: air.pressurePa,
    gasTemperatureK,
    cylinderContentM3: input.gas?.cylinderContentM3 ?? DEFAULT_CYLINDER_CONTENT_M3,
    lossPerDayFraction: loss.fraction,
    lossSource: loss.source,
    grossLiftKg,
    totalMassKg: mass.totalMassKg,
    cautionFreeLiftRatio: limits.cautionFreeLiftRatio,
  });
  if (helium.daysToTopUp !== null) {
    flags.push(
      makeFlag("helium-top-up", "ok", {
        figures: {
          topUpAfter: figure("duration", helium.daysToTopUp * SECONDS_PER_DAY),
          lossPerDay: figure("ratio", helium.lossPerDayFraction),
          freeLiftRatio: figure("ratio", freeLiftRatio, limits.cautionFreeLiftRatio),
        },
        params: { lossSource: helium.lossSource },
      }),
    );
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
    wind,
    gust,
    maxTetherOutM: maxOutM,
    helium,
    payloadCentres,
    flags,
  };
}
