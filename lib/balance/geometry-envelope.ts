/**
 * Defaults for an envelope model derived from its hull: where the rail, the tether point and the
 * sail's pressure centre go, and the sail's aerodynamic coefficients. These are design choices of
 * Trimrail's demo models (invented), not measured figures: a maker replaces them with their own.
 */
import { finPanels, integrateHullProfile, profileRadiusAt, type HullParams } from "./geometry";
import type { Vec } from "./vec";

export interface DerivedEnvelopeGeometry {
  readonly gasVolumeM3: number;
  readonly buoyancyCentre: Vec;
  readonly fabricMassCentre: Vec;
  readonly surfaceAreaM2: number;
  readonly fabricMassKg: number | null;
  readonly tetherPoint: Vec;
  readonly rail: { readonly startX: number; readonly endX: number; readonly z: number };
  readonly aero: {
    readonly sailAreaM2: number;
    readonly liftSlopePerRad: number;
    readonly zeroLiftTrimDeg: number;
    readonly dragCoefficient: number;
    readonly pressureCentre: Vec;
  };
}

/** The rail runs ± this fraction of the hull length about the centre of buoyancy (our design). */
const RAIL_HALF_LENGTH_FRACTION = 0.15;
/** The bridle lines meet this many largest radii below the belly (our design)... */
const TETHER_DROP_RADII = 0.6;
/** ...and this fraction of the length ahead of the centre of buoyancy, so that the sail's lift
 *  acts well aft of the tether point and steadies the trim as the wind rises (our design). */
const TETHER_FORWARD_FRACTION = 0.05;
/** The sail is rigged so it still lifts with the hull level (our design). */
const DEMO_ZERO_LIFT_TRIM_DEG = -6;
/** Drag coefficient on the sail area for a smooth fabric lifter (assumed; a maker measures it). */
const DEMO_DRAG_COEFFICIENT = 0.15;

export function deriveEnvelopeGeometry(params: Readonly<HullParams>): DerivedEnvelopeGeometry {
  const integrals = integrateHullProfile(params);
  const radiusM = 0.5 * params.maxDiameterM;
  const bx = integrals.buoyancyCentre.x;
  const railStartX = bx - RAIL_HALF_LENGTH_FRACTION * params.lengthM;
  const railEndX = bx + RAIL_HALF_LENGTH_FRACTION * params.lengthM;
  // The straight rail hangs from the belly's lowest point along its span.
  const widestX = Math.min(railEndX, Math.max(railStartX, params.maxDiameterAtFraction * params.lengthM));
  const bellyZ = -profileRadiusAt(params, widestX);

  // Sail: the hull's side silhouette seen from above plus each fin's projection on the
  // horizontal plane (a vertical fin adds nothing to lift).
  let sailArea = integrals.hullPlanformAreaM2;
  let sailMomentX = integrals.hullPlanformAreaM2 * integrals.hullPlanformCentroidXM;
  let halfSpan = radiusM;
  for (const panel of finPanels(params)) {
    const projected = panel.planformAreaM2 * Math.abs(Math.cos(panel.angleRad));
    sailArea += projected;
    sailMomentX += projected * panel.centroidXM;
    const tipRadial = Math.max(...panel.corners.map(([, radial]) => radial));
    halfSpan = Math.max(halfSpan, tipRadial * Math.abs(Math.cos(panel.angleRad)));
  }
  // Low-aspect-ratio wing: dCL/dα = π·AR/2 (R. T. Jones, NACA Report 835, 1946).
  const aspectRatio = (4 * halfSpan * halfSpan) / sailArea;

  return {
    gasVolumeM3: integrals.gasVolumeM3,
    buoyancyCentre: integrals.buoyancyCentre,
    fabricMassCentre: integrals.fabricMassCentre,
    surfaceAreaM2: integrals.surfaceAreaM2,
    fabricMassKg: integrals.fabricMassKg,
    tetherPoint: { x: bx - TETHER_FORWARD_FRACTION * params.lengthM, z: -radiusM * (1 + TETHER_DROP_RADII) },
    rail: {
      startX: railStartX,
      endX: railEndX,
      z: bellyZ,
    },
    aero: {
      sailAreaM2: sailArea,
      liftSlopePerRad: (Math.PI * aspectRatio) / 2,
      zeroLiftTrimDeg: DEMO_ZERO_LIFT_TRIM_DEG,
      dragCoefficient: DEMO_DRAG_COEFFICIENT,
      pressureCentre: { x: sailMomentX / sailArea, z: 0 },
    },
  };
}

/** Three invented envelope models of about 0.6, 1.1 and 1.8 m³ of gas. */
export const demoHulls = {
  "ridge-06": {
    lengthM: 1.75,
    maxDiameterM: 0.86,
    maxDiameterAtFraction: 0.4,
    noseShape: 0.5,
    tailShape: 1,
    fins: { count: 3, rootChordM: 0.45, tipChordM: 0.25, spanM: 0.3, trailingEdgeFraction: 0.96 },
    fabricArealDensityKgM2: 0.065,
  },
  "ridge-11": {
    lengthM: 2.2,
    maxDiameterM: 1.05,
    maxDiameterAtFraction: 0.4,
    noseShape: 0.5,
    tailShape: 1,
    fins: { count: 3, rootChordM: 0.55, tipChordM: 0.3, spanM: 0.36, trailingEdgeFraction: 0.96 },
    fabricArealDensityKgM2: 0.065,
  },
  "ridge-18": {
    lengthM: 2.6,
    maxDiameterM: 1.24,
    maxDiameterAtFraction: 0.4,
    noseShape: 0.5,
    tailShape: 1,
    fins: { count: 3, rootChordM: 0.65, tipChordM: 0.35, spanM: 0.42, trailingEdgeFraction: 0.96 },
    fabricArealDensityKgM2: 0.065,
  },
} as const satisfies Record<string, HullParams>;

export type DemoHullName = keyof typeof demoHulls;
