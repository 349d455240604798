/**
 * The envelope's shape: a parametric hull of revolution (rounded nose, tapered tail) with thin
 * fin/sail panels at the tail. Gas volume, centre of buoyancy, surface area and the fabric's
 * area-weighted centre of mass come from integrating the profile; the same shape as a triangle
 * mesh (geometry-mesh.ts) must agree within 0.5 %.
 *
 * Profile (nose tip at x = 0, largest radius R at x_m = f·L):
 *   nose, 0 ≤ x ≤ x_m:  r = R·(1 − t²)^n,  t = (x_m − x)/x_m   (n = 0.5 is an elliptical nose)
 *   tail, x_m ≤ x ≤ L:  r = R·(1 − s²)^k,  s = (x − x_m)/(L − x_m) (k = 1 is a parabolic taper)
 * Both pieces have zero slope at x_m, so the hull is smooth there.
 */
import { z } from "zod";
import { buildRevolutionMesh, DEFAULT_MESH_RESOLUTION, type MeshData, type MeshResolution } from "./geometry-mesh";
import { DEFAULT_PROFILE_STATIONS, integrateRevolution } from "./geometry-revolution";
import { degreesToRadians } from "./units-si";
import type { Vec } from "./vec";

const bounded = (label: string, min: number, max: number) =>
  z.number(`${label} must be a finite number`).min(min, `${label} must be at least ${min}`).max(max, `${label} must be at most ${max}`);

export const finParamsSchema = z
  .object({
    count: z.number().int("fin count must be a whole number").min(0).max(8),
    rootChordM: bounded("fin root chord (m)", 0, 50),
    tipChordM: bounded("fin tip chord (m)", 0, 50),
    spanM: bounded("fin span (m)", 0, 20),
    /** Where the fins' trailing edges sit, as a fraction of the hull length. */
    trailingEdgeFraction: bounded("fin trailing edge fraction", 0.3, 1),
    /** Angle of the first fin from +y towards +z; 90 puts it on top. */
    firstAngleDeg: bounded("first fin angle (deg)", -360, 360).optional(),
  })
  .refine((fins) => fins.tipChordM <= fins.rootChordM, {
    message: "fin tip chord must not exceed the root chord",
    path: ["tipChordM"],
  });

export const hullParamsSchema = z.object({
  lengthM: bounded("hull length (m)", 0.1, 50),
  maxDiameterM: bounded("largest diameter (m)", 0.02, 20),
  /** Position of the largest diameter as a fraction of the length. */
  maxDiameterAtFraction: bounded("position of the largest diameter", 0.15, 0.85),
  noseShape: bounded("nose shape exponent", 0.3, 0.7).optional(),
  tailShape: bounded("tail shape exponent", 0.5, 2).optional(),
  fins: finParamsSchema.optional(),
  fabricArealDensityKgM2: bounded("fabric areal density (kg/m²)", 0, 5).optional(),
});

export type HullParams = z.infer<typeof hullParamsSchema>;
export type FinParams = z.infer<typeof finParamsSchema>;

export const DEFAULT_NOSE_SHAPE = 0.5;
export const DEFAULT_TAIL_SHAPE = 1;

export function profileRadiusAt(params: Readonly<HullParams>, xM: number): number {
  const lengthM = params.lengthM;
  if (!(xM > 0 && xM < lengthM)) return 0;
  const radiusM = 0.5 * params.maxDiameterM;
  const maxAtM = params.maxDiameterAtFraction * lengthM;
  if (xM <= maxAtM) {
    const t = (maxAtM - xM) / maxAtM;
    return radiusM * Math.pow(1 - t * t, params.noseShape ?? DEFAULT_NOSE_SHAPE);
  }
  const s = (xM - maxAtM) / (lengthM - maxAtM);
  return radiusM * Math.pow(Math.max(0, 1 - s * s), params.tailShape ?? DEFAULT_TAIL_SHAPE);
}

/** One fin as a flat quadrilateral: root leading/trailing edge on the hull, tip outboard. */
export interface FinPanel {
  readonly angleRad: number;
  /** Corners in (x, radial distance from the axis): root LE, root TE, tip TE, tip LE. */
  readonly corners: readonly (readonly [number, number])[];
  /** One face's area. */
  readonly planformAreaM2: number;
  readonly centroidXM: number;
  readonly centroidRadialM: number;
}

export function finPanels(params: Readonly<HullParams>): FinPanel[] {
  const fins = params.fins;
  if (!fins || fins.count === 0 || fins.spanM === 0 || fins.rootChordM === 0) return [];
  const trailingX = fins.trailingEdgeFraction * params.lengthM;
  const leadingX = Math.max(0, trailingX - fins.rootChordM);
  const rootTrailingR = profileRadiusAt(params, trailingX);
  const tipR = rootTrailingR + fins.spanM;
  const corners: [number, number][] = [
    [leadingX, profileRadiusAt(params, leadingX)],
    [trailingX, rootTrailingR],
    [trailingX, tipR],
    [trailingX - fins.tipChordM, tipR],
  ];
  // Quadrilateral split into two triangles (0,1,2) and (0,2,3).
  let area = 0;
  let mx = 0;
  let mr = 0;
  for (const [i, j] of [
    [1, 2],
    [2, 3],
  ] as const) {
    const [x0, r0] = corners[0];
    const [x1, r1] = corners[i];
    const [x2, r2] = corners[j];
    const triangle = 0.5 * Math.abs((x1 - x0) * (r2 - r0) - (x2 - x0) * (r1 - r0));
    area += triangle;
    mx += (triangle * (x0 + x1 + x2)) / 3;
    mr += (triangle * (r0 + r1 + r2)) / 3;
  }
  const firstRad = degreesToRadians(fins.firstAngleDeg ?? 90);
  const panels: FinPanel[] = [];
  for (let k = 0; k < fins.count; k++) {
    panels.push({
      angleRad: firstRad + (2 * Math.PI * k) / fins.count,
      corners,
      planformAreaM2: area,
      centroidXM: area > 0 ? mx / area : trailingX,
      centroidRadialM: area > 0 ? mr / area : tipR,
    });
  }
  return panels;
}

export interface HullIntegrals {
  readonly gasVolumeM3: number;
  readonly buoyancyCentre: Vec;
  /** Hull skin plus both faces of every fin (a fin is two plies of fabric). */
  readonly surfaceAreaM2: number;
  readonly hullSurfaceAreaM2: number;
  readonly finAreaM2: number;
  /** Area-weighted centre of the fabric (hull skin and fins): where uniform cloth's mass sits. */
  readonly fabricMassCentre: Vec;
  /** Present when the params give a fabric areal density. */
  readonly fabricMassKg: number | null;
  /** Side-view silhouette of the hull alone (2∫r dx) and its centroid x. */
  readonly hullPlanformAreaM2: number;
  readonly hullPlanformCentroidXM: number;
}

export function integrateHullProfile(params: Readonly<HullParams>, stations: number = DEFAULT_PROFILE_STATIONS): HullIntegrals {
  const hull = integrateRevolution((xM) => profileRadiusAt(params, xM), 0, params.lengthM, stations);
  let finArea = 0;
  let finMomentX = 0;
  let finMomentZ = 0;
  for (const panel of finPanels(params)) {
    const bothFaces = 2 * panel.planformAreaM2;
    finArea += bothFaces;
    finMomentX += bothFaces * panel.centroidXM;
    finMomentZ += bothFaces * panel.centroidRadialM * Math.sin(panel.angleRad);
  }
  const surfaceAreaM2 = hull.surfaceAreaM2 + finArea;
  const fabricMassCentre: Vec = {
    x: (hull.surfaceAreaM2 * hull.surfaceCentroidXM + finMomentX) / surfaceAreaM2,
    z: finMomentZ / surfaceAreaM2,
  };
  return {
    gasVolumeM3: hull.volumeM3,
    buoyancyCentre: { x: hull.volumeCentroidXM, z: 0 },
    surfaceAreaM2,
    hullSurfaceAreaM2: hull.surfaceAreaM2,
    finAreaM2: finArea,
    fabricMassCentre,
    fabricMassKg: params.fabricArealDensityKgM2 === undefined ? null : params.fabricArealDensityKgM2 * surfaceAreaM2,
    hullPlanformAreaM2: hull.planformAreaM2,
    hullPlanformCentroidXM: hull.planformCentroidXM,
  };
}

/** The closed gas hull as a mesh (no fins), outward-wound. */
export function buildHullMesh(params: Readonly<HullParams>, resolution: MeshResolution = DEFAULT_MESH_RESOLUTION): MeshData {
  return buildRevolutionMesh((xM) => profileRadiusAt(params, xM), 0, params.lengthM, resolution);
}

/** Fins as two-sided flat quads: 4 vertices and 4 triangles (2 per face) per fin. */
export function buildFinMesh(params: Readonly<HullParams>): MeshData {
  const panels = finPanels(params);
  const positions = new Float32Array(panels.length * 12);
  const indices = new Uint32Array(panels.length * 12);
  let v = 0;
  let t = 0;
  panels.forEach((panel, k) => {
    const cos = Math.cos(panel.angleRad);
    const sin = Math.sin(panel.angleRad);
    for (const [xM, radialM] of panel.corners) {
      positions[v++] = xM;
      positions[v++] = radialM * cos;
      positions[v++] = radialM * sin;
    }
    const b = k * 4;
    indices.set([b, b + 1, b + 2, b, b + 2, b + 3, b, b + 2, b + 1, b, b + 3, b + 2], t);
    t += 12;
  });
  return { positions, indices };
}

// Memo of each hull's skin area: the Planner passes the same hull object on every drag, and the
// profile integral is the costly part of the helium budget.
const skinAreaByHull = new WeakMap<object, number>();

/** Area of the gas-holding hull skin (no fins), m²: what the helium permeates through. */
export function hullSkinAreaM2(params: Readonly<HullParams>): number {
  const known = skinAreaByHull.get(params);
  if (known !== undefined) return known;
  const areaM2 = integrateHullProfile(params).hullSurfaceAreaM2;
  skinAreaByHull.set(params, areaM2);
  return areaM2;
}
