import { DEFAULT_LIMITS, deriveEnvelopeGeometry, type HullParams, type Limits } from "@/lib/balance";
import type { EnvelopeModelValues } from "@/lib/catalogue/schemas";
import type { NumberFieldSpec } from "./si-form";

// The envelope model form's number fields: where each lives in the SI values and how it is shown.

export interface LabelledField extends NumberFieldSpec {
  label: string;
  /** The unit of a plain number, e.g. "°". */
  plainUnit?: string;
  testId?: string;
}

export const HULL_FIELDS: readonly LabelledField[] = [
  { path: "hull.lengthM", quantity: "length", label: "Hull length", testId: "hull-length" },
  { path: "hull.maxDiameterM", quantity: "length", label: "Largest diameter", testId: "hull-diameter" },
  { path: "hull.maxDiameterAtFraction", label: "Largest diameter at (fraction of length)" },
  { path: "hull.noseShape", label: "Nose shape exponent (0.5 elliptical)", empty: "undefined" },
  { path: "hull.tailShape", label: "Tail shape exponent (1 parabolic)", empty: "undefined" },
  { path: "hull.fabricArealDensityKgM2", label: "Fabric areal density", plainUnit: "kg/m²", empty: "undefined" },
  { path: "hull.fins.count", label: "Fins" },
  { path: "hull.fins.rootChordM", quantity: "length", label: "Fin root chord" },
  { path: "hull.fins.tipChordM", quantity: "length", label: "Fin tip chord" },
  { path: "hull.fins.spanM", quantity: "length", label: "Fin span" },
  { path: "hull.fins.trailingEdgeFraction", label: "Fin trailing edge at (fraction of length)" },
];

export const MASS_RIGGING_FIELDS: readonly LabelledField[] = [
  { path: "nominalMassKg", quantity: "mass", label: "Envelope mass", testId: "model-mass" },
  { path: "massCentreXM", quantity: "length", label: "Mass centre, from the nose" },
  { path: "massCentreZM", quantity: "length", label: "Mass centre, above the axis" },
  { path: "tetherPointXM", quantity: "length", label: "Tether point, from the nose" },
  { path: "tetherPointZM", quantity: "length", label: "Tether point, above the axis (below −)" },
  { path: "railStartXM", quantity: "length", label: "Rail start, from the nose" },
  { path: "railEndXM", quantity: "length", label: "Rail end, from the nose" },
  { path: "railZM", quantity: "length", label: "Rail height, above the axis (below −)" },
  { path: "railTabCount", label: "Rail tabs" },
];

export const AERO_FIELDS: readonly LabelledField[] = [
  { path: "aero.sailAreaM2", quantity: "surfaceArea", label: "Sail area" },
  { path: "aero.liftSlopePerRad", label: "Lift slope", plainUnit: "per rad" },
  { path: "aero.zeroLiftTrimDeg", label: "Zero-lift trim", plainUnit: "°" },
  { path: "aero.dragCoefficient", label: "Drag coefficient" },
  { path: "aero.pressureCentre.x", quantity: "length", label: "Pressure centre, from the nose" },
  { path: "aero.pressureCentre.z", quantity: "length", label: "Pressure centre, above the axis" },
];

/** Where each default limit comes from, as lib/balance/flags.ts says beside DEFAULT_LIMITS. */
const SOURCE: Record<keyof Limits, string> = {
  cautionFreeLiftRatio: "common practice",
  cautionTrimDeg: "common practice",
  stopTrimDeg: "common practice",
  cautionTetherAngleDeg: "common practice",
  stopTetherAngleDeg: "common practice",
  loadFactor: "common practice",
  mountCautionFraction: "common practice",
  safetyLineFactor: "common practice",
  tetherSafetyFactor: "common practice",
  clearanceCautionM: "common practice",
  screwProofStrengthPa: "SAE J429 grade 2",
};

export interface LimitField extends LabelledField {
  limitKey: keyof Limits;
  defaultSI: number;
  source: string;
}

const limit = (
  key: keyof Limits,
  label: string,
  spec: Omit<NumberFieldSpec, "path" | "empty"> & { plainUnit?: string } = {},
): LimitField => ({
  limitKey: key,
  path: `limits.${key}`,
  empty: "undefined",
  label,
  defaultSI: DEFAULT_LIMITS[key],
  source: SOURCE[key],
  ...spec,
});

export const LIMIT_FIELDS: readonly LimitField[] = [
  limit("cautionFreeLiftRatio", "Caution below free-lift ratio", { quantity: "ratio" }),
  limit("cautionTrimDeg", "Caution beyond calm trim", { plainUnit: "°" }),
  limit("stopTrimDeg", "Stop beyond trim", { plainUnit: "°" }),
  limit("cautionTetherAngleDeg", "Caution beyond tether angle", { plainUnit: "°" }),
  limit("stopTetherAngleDeg", "Stop beyond tether angle", { plainUnit: "°" }),
  limit("loadFactor", "Load factor on payload weight", { plainUnit: "×" }),
  limit("mountCautionFraction", "Caution above mount load", { quantity: "ratio" }),
  limit("safetyLineFactor", "Safety line at least", { plainUnit: "× payload weight" }),
  limit("tetherSafetyFactor", "Tether at least", { plainUnit: "× largest tension" }),
  limit("clearanceCautionM", "Caution below clearance", { quantity: "smallLength" }),
  limit("screwProofStrengthPa", "Screw proof strength", { quantity: "stress" }),
];

export const MODEL_NUMBER_FIELDS: readonly NumberFieldSpec[] = [...HULL_FIELDS, ...MASS_RIGGING_FIELDS, ...AERO_FIELDS, ...LIMIT_FIELDS];

/** The rigging a hull suggests (lib/balance geometry-envelope.ts): where a new model starts. */
export function suggestedRigging(
  hull: HullParams,
): Pick<
  EnvelopeModelValues,
  "massCentreXM" | "massCentreZM" | "tetherPointXM" | "tetherPointZM" | "railStartXM" | "railEndXM" | "railZM" | "aero"
> {
  const g = deriveEnvelopeGeometry(hull);
  return {
    massCentreXM: g.fabricMassCentre.x,
    massCentreZM: g.fabricMassCentre.z,
    tetherPointXM: g.tetherPoint.x,
    tetherPointZM: g.tetherPoint.z,
    railStartXM: g.rail.startX,
    railEndXM: g.rail.endX,
    railZM: g.rail.z,
    aero: { ...g.aero, pressureCentre: { ...g.aero.pressureCentre } },
  };
}
