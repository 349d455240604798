import { dayLiftCheck, setupMass, type BalanceInput, type DayLiftCheckResult, type HullParams, type LimitsInput } from "@/lib/balance";
import type { Attachment, Thread } from "@/lib/domain";
import type { SetupDraft } from "./setup-draft";

// The catalogue facts a setup refers to, in the shape the database rows already have.
export interface ModelSpec {
  gasVolumeM3: number;
  nominalMassKg: number;
  buoyancyCentreXM: number;
  buoyancyCentreZM: number;
  massCentreXM: number;
  massCentreZM: number;
  tetherPointXM: number;
  tetherPointZM: number;
  railStartXM: number;
  railEndXM: number;
  railZM: number;
  hullJson: HullParams;
  aeroJson: NonNullable<BalanceInput["envelope"]["aero"]> | null;
  limitsJson: LimitsInput;
}
export interface UnitSpec {
  measuredMassKg: number;
  /** Measured ÷ predicted gross lift at the unit's latest lift test (lib/setups/calibration.ts); null: not tested. */
  calibrationFactor: number | null;
}
export interface MountSpec {
  thread: Thread;
  massKg: number;
  ratedLoadKg: number;
  safetyLineBreakingLoadN: number;
}
export interface AdapterSpec {
  fromThread: Attachment;
  toThread: Thread;
  massKg: number;
}
export interface SetupCatalogue {
  model: ModelSpec;
  unit: UnitSpec | null;
  mount: MountSpec;
  adaptersById: Readonly<Record<string, AdapterSpec>>;
}

function tetherInput(tether: NonNullable<SetupDraft["tether"]>): NonNullable<BalanceInput["tether"]> {
  const { diameterM, ...line } = tether;
  return diameterM === null ? line : { ...line, diameterM };
}

/**
 * Turns a setup and the catalogue rows it names into the engine's input. The same function runs in
 * the Planner (live) and on the server (stored result), so both always agree.
 * A serial unit's weighed mass replaces the model's nominal mass, and its calibration factor scales
 * the model's drawn volume to the volume it really holds. A day's lift check, when the person
 * entered one and it can be used, then replaces the purity (or the volume) with the one it implies.
 */
export function toBalanceInput(draft: SetupDraft, catalogue: SetupCatalogue): BalanceInput {
  const planned = plannedBalanceInput(draft, catalogue);
  const check = liftCheckOf(draft, planned);
  if (!check || check.problem) return planned;
  return {
    ...planned,
    envelope: { ...planned.envelope, gasVolumeM3: check.gasVolumeM3 },
    gas: { ...planned.gas, purity: check.purity },
  };
}

/** What the day's lift check of this draft implies, against the input as planned; null without one. */
export function liftCheckOf(draft: SetupDraft, planned: BalanceInput): DayLiftCheckResult | null {
  const check = draft.liftCheck;
  if (!check) return null;
  return dayLiftCheck({
    freeLiftKg: check.freeLiftKg,
    weighedMassKg: check.weighedWith === "setup" ? setupMass(planned).totalMassKg : planned.envelope.massKg,
    temperatureC: check.temperatureC,
    altitudeM: draft.site.altitudeM,
    ...(draft.site.pressurePa === null ? {} : { pressurePa: draft.site.pressurePa }),
    superheatK: draft.gas.superheatK,
    fillFraction: draft.gas.fillFraction,
    gasVolumeM3: planned.envelope.gasVolumeM3,
    purity: draft.gas.purity,
    solveFor: check.solveFor,
  });
}

const usableFactor = (factor: number | null | undefined): number =>
  factor !== null && factor !== undefined && Number.isFinite(factor) && factor > 0 ? factor : 1;

/** The engine's input from the draft as entered, before any lift check. */
export function plannedBalanceInput(draft: SetupDraft, catalogue: SetupCatalogue): BalanceInput {
  const { model, unit, mount, adaptersById } = catalogue;
  const site = draft.site;
  return {
    envelope: {
      gasVolumeM3: model.gasVolumeM3 * (unit ? usableFactor(unit.calibrationFactor) : 1),
      massKg: unit?.measuredMassKg ?? model.nominalMassKg,
      buoyancyCentre: { x: model.buoyancyCentreXM, z: model.buoyancyCentreZM },
      massCentre: { x: model.massCentreXM, z: model.massCentreZM },
      tetherPoint: { x: model.tetherPointXM, z: model.tetherPointZM },
      rail: { startX: model.railStartXM, endX: model.railEndXM, z: model.railZM },
      ...(model.aeroJson ? { aero: model.aeroJson } : {}),
      limits: model.limitsJson,
      hull: model.hullJson,
    },
    gas: { purity: draft.gas.purity, superheatK: draft.gas.superheatK, fillFraction: draft.gas.fillFraction },
    site: {
      altitudeM: site.altitudeM,
      ...(site.temperatureC === null ? {} : { temperatureC: site.temperatureC }),
      ...(site.pressurePa === null ? {} : { pressurePa: site.pressurePa }),
      windMS: site.windMS,
      ...(site.gustMS === null ? {} : { gustMS: site.gustMS }),
      windMeasuredAtM: site.windMeasuredAtM,
      windShearExponent: site.windShearExponent,
      ...(site.relativeHumidity === null ? {} : { relativeHumidity: site.relativeHumidity }),
    },
    mount: {
      positionX: draft.mountPositionXM,
      massKg: mount.massKg,
      thread: mount.thread,
      ratedLoadKg: mount.ratedLoadKg,
      safetyLineBreakingLoadN: mount.safetyLineBreakingLoadN,
    },
    payloads: draft.payloads.map((p) => {
      const adapter = p.adapterId ? adaptersById[p.adapterId] : undefined;
      return {
        name: p.name,
        massKg: p.massKg,
        offset: { x: p.offsetXM, z: p.offsetZM },
        attachment: p.attachment,
        ...(adapter ? { adapter: { massKg: adapter.massKg, from: adapter.fromThread, to: adapter.toThread } } : {}),
        size: { lengthM: p.lengthM, widthM: p.widthM, heightM: p.heightM },
        dragAreaM2: p.dragAreaM2,
      };
    }),
    ...(draft.tether ? { tether: tetherInput(draft.tether) } : {}),
  };
}
