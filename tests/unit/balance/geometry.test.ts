import fc from "fast-check";
import { describe, expect, it } from "vitest";
import {
  buildFinMesh,
  buildHullMesh,
  buildRevolutionMesh,
  deriveEnvelopeGeometry,
  demoHulls,
  hullParamsSchema,
  integrateHullProfile,
  integrateRevolution,
  mergeMeshes,
  meshSurfaceArea,
  meshVolumeAndCentroid,
  profileRadiusAt,
  type MeshData,
  type RadiusFunction,
} from "@/lib/balance";

// Check values: CRC Standard Mathematical Tables (Beyer, 28th ed., 1987), solids (references.md).
const FINE = { segments: 256, rings: 400 };
const relative = (a: number, b: number): number => Math.abs(a / b - 1);

interface Solid {
  name: string;
  radiusAt: RadiusFunction;
  x0: number;
  x1: number;
  volume: number;
  centroidX: number;
}

const r = 0.7;
const h = 1.3;
const R = 1;
const capH = 0.5;
const SOLIDS: Solid[] = [
  {
    // CRC: hemisphere 2/3·π·r³, centroid 3r/8 from the flat face (flat face at x = 0)
    name: "hemisphere",
    radiusAt: (x) => Math.sqrt(Math.max(0, r * r - x * x)),
    x0: 0,
    x1: r,
    volume: (2 / 3) * Math.PI * r ** 3,
    centroidX: (3 * r) / 8,
  },
  {
    // CRC: cone π·r²·h/3, centroid h/4 above the base (base at x = 0)
    name: "cone",
    radiusAt: (x) => r * (1 - x / h),
    x0: 0,
    x1: h,
    volume: (Math.PI * r * r * h) / 3,
    centroidX: h / 4,
  },
  {
    // CRC: spherical cap π·h²·(3R − h)/3, centroid 3(2R − h)²/(4(3R − h)) above the sphere's centre
    name: "spherical cap (R = 1, h = 0.5)",
    radiusAt: (x) => Math.sqrt(Math.max(0, R * R - x * x)),
    x0: R - capH,
    x1: R,
    volume: (Math.PI * capH ** 2 * (3 * R - capH)) / 3,
    centroidX: (3 * (2 * R - capH) ** 2) / (4 * (3 * R - capH)),
  },
];

describe("integrateRevolution and meshVolumeAndCentroid against CRC solids", () => {
  it("checks the CRC cap test point: R = 1, h = 0.5 → V = 0.654498, centroid 0.675 (derived)", () => {
    const cap = SOLIDS[2];
    expect(cap.volume).toBeCloseTo(0.654498, 6);
    expect(cap.centroidX).toBeCloseTo(0.675, 12);
  });

  it.each(SOLIDS.map((solid) => [solid.name, solid] as const))("gives the %s's volume and centroid", (_, solid) => {
    const profile = integrateRevolution(solid.radiusAt, solid.x0, solid.x1);
    expect(relative(profile.volumeM3, solid.volume)).toBeLessThan(1e-4);
    expect(profile.volumeCentroidXM).toBeCloseTo(solid.centroidX, 4);
    const mesh = buildRevolutionMesh(solid.radiusAt, solid.x0, solid.x1, FINE);
    const fromMesh = meshVolumeAndCentroid(mesh.positions, mesh.indices);
    expect(relative(fromMesh.volumeM3, solid.volume)).toBeLessThan(1e-3);
    expect(fromMesh.centroid.x).toBeCloseTo(solid.centroidX, 3);
    expect(Math.abs(fromMesh.centroid.y) + Math.abs(fromMesh.centroid.z)).toBeLessThan(1e-6);
  });

  it("gives a triaxial ellipsoid 4/3·π·a·b·c with its centroid at the centre (CRC)", () => {
    const [a, b, c] = [1.2, 0.5, 0.8];
    const spheroid = buildRevolutionMesh((x) => c * Math.sqrt(Math.max(0, 1 - ((x - a) / a) ** 2)), 0, 2 * a, FINE);
    // Squash y from c to b: volume scales by b/c, which the divergence theorem must see.
    const positions = Float32Array.from(spheroid.positions, (value, i) => (i % 3 === 1 ? (value * b) / c : value));
    const result = meshVolumeAndCentroid(positions, spheroid.indices);
    expect(relative(result.volumeM3, (4 / 3) * Math.PI * a * b * c)).toBeLessThan(1e-3);
    expect(result.centroid.x).toBeCloseTo(a, 4);
    const profile = integrateRevolution((x) => c * Math.sqrt(Math.max(0, 1 - ((x - a) / a) ** 2)), 0, 2 * a);
    expect(relative(profile.volumeM3 * (b / c), (4 / 3) * Math.PI * a * b * c)).toBeLessThan(1e-4);
  });

  it("gives a closed mesh: reversing every triangle negates the volume", () => {
    const mesh = buildRevolutionMesh(SOLIDS[1].radiusAt, 0, h, { segments: 32, rings: 16 });
    const reversed = Uint32Array.from(mesh.indices);
    for (let t = 0; t < reversed.length; t += 3) [reversed[t + 1], reversed[t + 2]] = [reversed[t + 2], reversed[t + 1]];
    expect(meshVolumeAndCentroid(mesh.positions, reversed).volumeM3).toBeCloseTo(
      -meshVolumeAndCentroid(mesh.positions, mesh.indices).volumeM3,
      9,
    );
  });
});

describe("integrateHullProfile against buildHullMesh", () => {
  it.each(Object.entries(demoHulls))("agrees within 0.5 %% for %s", (_, params) => {
    const profile = integrateHullProfile(params);
    for (const segments of [48, 64, 128]) {
      const hull = buildHullMesh(params, { segments, rings: 160 });
      const volume = meshVolumeAndCentroid(hull.positions, hull.indices);
      expect(relative(volume.volumeM3, profile.gasVolumeM3)).toBeLessThan(0.005);
      expect(Math.abs(volume.centroid.x - profile.buoyancyCentre.x) / params.lengthM).toBeLessThan(0.005);
      const all = mergeMeshes([hull, buildFinMesh(params)]);
      const area = meshSurfaceArea(all.positions, all.indices);
      expect(relative(area.areaM2, profile.surfaceAreaM2)).toBeLessThan(0.005);
      expect(Math.abs(area.centroid.x - profile.fabricMassCentre.x) / params.lengthM).toBeLessThan(0.005);
      expect(Math.abs(area.centroid.z - profile.fabricMassCentre.z) / params.lengthM).toBeLessThan(0.005);
    }
  });

  it("agrees within 0.5 % for any valid hull", () => {
    const num = (min: number, max: number) => fc.double({ min, max, noNaN: true });
    const hullArb = fc.record({
      lengthM: num(0.1, 50),
      maxDiameterM: num(0.02, 20),
      maxDiameterAtFraction: num(0.15, 0.85),
      noseShape: num(0.3, 0.7),
      tailShape: num(0.5, 2),
      fins: fc.record({
        count: fc.integer({ min: 0, max: 8 }),
        rootChordM: num(0, 5),
        tipChordM: num(0, 0),
        spanM: num(0, 5),
        trailingEdgeFraction: num(0.3, 1),
      }),
    });
    fc.assert(
      fc.property(hullArb, (params) => {
        expect(hullParamsSchema.safeParse(params).success).toBe(true);
        const profile = integrateHullProfile(params);
        const hull = buildHullMesh(params, { segments: 64, rings: 200 });
        expect(relative(meshVolumeAndCentroid(hull.positions, hull.indices).volumeM3, profile.gasVolumeM3)).toBeLessThan(0.005);
        const all = mergeMeshes([hull, buildFinMesh(params)]);
        expect(relative(meshSurfaceArea(all.positions, all.indices).areaM2, profile.surfaceAreaM2)).toBeLessThan(0.005);
      }),
      { numRuns: 50 },
    );
  });

  it("puts fins' fabric above the axis when there is one fin, on top", () => {
    const params = { ...demoHulls["ridge-11"], fins: { ...demoHulls["ridge-11"].fins, count: 1 } };
    expect(integrateHullProfile(params).fabricMassCentre.z).toBeGreaterThan(0);
  });

  it("makes the demo models about 0.6, 1.1 and 1.8 m³", () => {
    expect(integrateHullProfile(demoHulls["ridge-06"]).gasVolumeM3).toBeCloseTo(0.6, 1);
    expect(integrateHullProfile(demoHulls["ridge-11"]).gasVolumeM3).toBeCloseTo(1.1, 1);
    expect(integrateHullProfile(demoHulls["ridge-18"]).gasVolumeM3).toBeCloseTo(1.8, 1);
  });

  it("accepts the demo models in hullParamsSchema and rejects a negative length", () => {
    for (const params of Object.values(demoHulls)) expect(hullParamsSchema.safeParse(params).success).toBe(true);
    expect(hullParamsSchema.safeParse({ ...demoHulls["ridge-06"], lengthM: -1 }).success).toBe(false);
  });
});

describe("profileRadiusAt", () => {
  const params = demoHulls["ridge-11"];
  it("is zero at the tips and the largest radius at its station", () => {
    expect(profileRadiusAt(params, 0)).toBe(0);
    expect(profileRadiusAt(params, params.lengthM)).toBe(0);
    expect(profileRadiusAt(params, params.maxDiameterAtFraction * params.lengthM)).toBeCloseTo(params.maxDiameterM / 2, 12);
  });
});

describe("deriveEnvelopeGeometry", () => {
  it("puts the rail under the belly around the centre of buoyancy and the tether point below", () => {
    const params = demoHulls["ridge-11"];
    const derived = deriveEnvelopeGeometry(params);
    expect(derived.rail.startX).toBeLessThan(derived.buoyancyCentre.x);
    expect(derived.rail.endX).toBeGreaterThan(derived.buoyancyCentre.x);
    expect(derived.rail.z).toBeCloseTo(-params.maxDiameterM / 2, 12);
    // the straight rail never enters the hull along its span
    for (let x = derived.rail.startX; x <= derived.rail.endX; x += 0.01) {
      expect(-profileRadiusAt(params, x)).toBeGreaterThanOrEqual(derived.rail.z - 1e-12);
    }
    expect(derived.tetherPoint.z).toBeLessThan(derived.rail.z);
    expect(derived.aero.pressureCentre.x).toBeGreaterThan(derived.buoyancyCentre.x);
  });
});

export type { MeshData };
