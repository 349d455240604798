/**
 * Triangle meshes of closed solids and thin panels, and their volume, centroid and area by the
 * divergence theorem: a closed, outward-wound mesh has V = Σ a·(b × c)/6 over its triangles
 * (signed tetrahedra from the origin) and centroid Σ Vᵢ(a + b + c)/4 / V.
 * Positions are x, y, z triplets in the body frame (x aft from the nose tip, y sideways, z up).
 */
import { stationX, type RadiusFunction } from "./geometry-revolution";
import type { Vec3 } from "./vec";

export interface MeshData {
  readonly positions: Float32Array;
  readonly indices: Uint32Array;
}

export interface MeshResolution {
  /** Vertices around each ring. The inscribed polygon loses (1 − sin(2π/n)/(2π/n)) of the
   *  volume: 0.16 % at 64, 0.04 % at 128. */
  readonly segments: number;
  /** Axial intervals between the end stations. */
  readonly rings: number;
}

export const DEFAULT_MESH_RESOLUTION: MeshResolution = { segments: 64, rings: 128 };

/** Below this radius an end station is a single pole vertex rather than a ring. */
const POLE_RADIUS_M = 1e-12;

/**
 * Closed mesh of the solid swept by r(x), x0 ≤ x ≤ x1, about the x axis. Ends with r = 0 close
 * at a pole; ends with r > 0 close with a flat disc (hemisphere, cone base, spherical cap).
 */
export function buildRevolutionMesh(
  radiusAt: RadiusFunction,
  x0M: number,
  x1M: number,
  resolution: MeshResolution = DEFAULT_MESH_RESOLUTION,
): MeshData {
  const segments = Math.max(3, Math.floor(resolution.segments));
  const intervals = Math.max(2, Math.floor(resolution.rings));
  const stations = intervals + 1;
  const radii = new Float64Array(stations);
  const xs = new Float64Array(stations);
  for (let i = 0; i < stations; i++) {
    xs[i] = stationX(x0M, x1M, i, intervals);
    radii[i] = Math.max(0, radiusAt(xs[i]));
  }
  const startPole = radii[0] <= POLE_RADIUS_M;
  const endPole = radii[intervals] <= POLE_RADIUS_M;
  // Ring stations: every station except pole ends; a disc end adds a centre vertex.
  const firstRing = startPole ? 1 : 0;
  const lastRing = endPole ? intervals - 1 : intervals;
  const ringCount = Math.max(0, lastRing - firstRing + 1);
  const vertexCount = ringCount * segments + 2;
  const positions = new Float32Array(vertexCount * 3);
  const cosines = new Float64Array(segments);
  const sines = new Float64Array(segments);
  for (let j = 0; j < segments; j++) {
    const angle = (2 * Math.PI * j) / segments;
    cosines[j] = Math.cos(angle);
    sines[j] = Math.sin(angle);
  }
  let v = 0;
  for (let i = firstRing; i <= lastRing; i++) {
    for (let j = 0; j < segments; j++) {
      positions[v++] = xs[i];
      positions[v++] = radii[i] * cosines[j];
      positions[v++] = radii[i] * sines[j];
    }
  }
  const startCentre = ringCount * segments;
  const endCentre = startCentre + 1;
  positions[v++] = x0M;
  positions[v++] = 0;
  positions[v++] = 0;
  positions[v++] = x1M;
  positions[v++] = 0;
  positions[v++] = 0;

  const triangleCount = Math.max(0, ringCount - 1) * segments * 2 + 2 * segments;
  const indices = new Uint32Array(triangleCount * 3);
  let t = 0;
  for (let ring = 0; ring < ringCount - 1; ring++) {
    const base = ring * segments;
    const next = base + segments;
    for (let j = 0; j < segments; j++) {
      const j1 = (j + 1) % segments;
      // (a, b, c) with a→b around the ring and a→c aft: (b − a) × (c − a) points outward.
      indices[t++] = base + j;
      indices[t++] = base + j1;
      indices[t++] = next + j;
      indices[t++] = base + j1;
      indices[t++] = next + j1;
      indices[t++] = next + j;
    }
  }
  const lastBase = (ringCount - 1) * segments;
  for (let j = 0; j < segments; j++) {
    const j1 = (j + 1) % segments;
    // Forward end faces −x, aft end faces +x.
    indices[t++] = startCentre;
    indices[t++] = j1;
    indices[t++] = j;
    indices[t++] = endCentre;
    indices[t++] = lastBase + j;
    indices[t++] = lastBase + j1;
  }
  return { positions, indices };
}

export interface MeshVolume {
  readonly volumeM3: number;
  readonly centroid: Vec3;
}

export function meshVolumeAndCentroid(positions: Float32Array | Float64Array, indices: Uint32Array): MeshVolume {
  let sixVolume = 0;
  let mx = 0;
  let my = 0;
  let mz = 0;
  for (let t = 0; t < indices.length; t += 3) {
    const a = indices[t] * 3;
    const b = indices[t + 1] * 3;
    const c = indices[t + 2] * 3;
    const ax = positions[a],
      ay = positions[a + 1],
      az = positions[a + 2];
    const bx = positions[b],
      by = positions[b + 1],
      bz = positions[b + 2];
    const cx = positions[c],
      cy = positions[c + 1],
      cz = positions[c + 2];
    const det = ax * (by * cz - bz * cy) - ay * (bx * cz - bz * cx) + az * (bx * cy - by * cx);
    sixVolume += det;
    mx += det * (ax + bx + cx);
    my += det * (ay + by + cy);
    mz += det * (az + bz + cz);
  }
  const volumeM3 = sixVolume / 6;
  // Σ (det/6)·(a + b + c)/4 / V = Σ det·(a + b + c) / (4·Σ det)
  const scale = sixVolume !== 0 ? 1 / (4 * sixVolume) : 0;
  return { volumeM3, centroid: { x: mx * scale, y: my * scale, z: mz * scale } };
}

export interface MeshArea {
  readonly areaM2: number;
  readonly centroid: Vec3;
}

/** Total triangle area (both faces of a two-sided panel count) and its area centroid. */
export function meshSurfaceArea(positions: Float32Array | Float64Array, indices: Uint32Array): MeshArea {
  let twiceArea = 0;
  let mx = 0;
  let my = 0;
  let mz = 0;
  for (let t = 0; t < indices.length; t += 3) {
    const a = indices[t] * 3;
    const b = indices[t + 1] * 3;
    const c = indices[t + 2] * 3;
    const ux = positions[b] - positions[a];
    const uy = positions[b + 1] - positions[a + 1];
    const uz = positions[b + 2] - positions[a + 2];
    const wx = positions[c] - positions[a];
    const wy = positions[c + 1] - positions[a + 1];
    const wz = positions[c + 2] - positions[a + 2];
    const nx = uy * wz - uz * wy;
    const ny = uz * wx - ux * wz;
    const nz = ux * wy - uy * wx;
    const doubled = Math.sqrt(nx * nx + ny * ny + nz * nz);
    twiceArea += doubled;
    mx += doubled * (positions[a] + positions[b] + positions[c]);
    my += doubled * (positions[a + 1] + positions[b + 1] + positions[c + 1]);
    mz += doubled * (positions[a + 2] + positions[b + 2] + positions[c + 2]);
  }
  const scale = twiceArea > 0 ? 1 / (3 * twiceArea) : 0;
  return { areaM2: twiceArea / 2, centroid: { x: mx * scale, y: my * scale, z: mz * scale } };
}

/** Joins meshes into one buffer pair (e.g. hull and fins for a single draw). */
export function mergeMeshes(meshes: readonly MeshData[]): MeshData {
  let vertexFloats = 0;
  let indexCount = 0;
  for (const mesh of meshes) {
    vertexFloats += mesh.positions.length;
    indexCount += mesh.indices.length;
  }
  const positions = new Float32Array(vertexFloats);
  const indices = new Uint32Array(indexCount);
  let vertexOffset = 0;
  let indexOffset = 0;
  for (const mesh of meshes) {
    positions.set(mesh.positions, vertexOffset);
    const base = vertexOffset / 3;
    for (let i = 0; i < mesh.indices.length; i++) indices[indexOffset + i] = mesh.indices[i] + base;
    vertexOffset += mesh.positions.length;
    indexOffset += mesh.indices.length;
  }
  return { positions, indices };
}
