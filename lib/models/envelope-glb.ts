/**
 * An envelope's GLB from its hull parameters: what `npm run models` writes for the demo hulls and
 * what the envelope GLB route serves for a model the maker edited.
 *
 * Each file keeps the BODY frame of lib/balance (metres; x aft from the nose tip, y sideways,
 * z up) so that the mesh and the balance engine agree number for number; the scene turns it into
 * three's y-up frame. Meshes: "hull" (the closed gas hull, smooth normals), "fins" (thin panels,
 * flat normals per face) and "seams" (gore seam lines just outside the skin).
 */
import { Document, WebIO, type Material } from "@gltf-transform/core";
import { buildFinMesh, buildHullMesh, type HullParams } from "../balance/geometry";
import type { MeshData, MeshResolution } from "../balance/geometry-mesh";

/** 64 around keeps the polygon's volume loss at 0.16 %; 96 cosine-spaced rings keep the files
 *  near 200 kB while the volume stays well inside the 0.5 % the tests allow. */
export const MODEL_RESOLUTION: MeshResolution = { segments: 64, rings: 96 };
/** Gores of the demo envelopes (our design); one seam line per gore boundary. */
export const GORE_COUNT = 8;
/** Seams sit this fraction outside the skin so they never z-fight with it. */
const SEAM_LIFT_FRACTION = 0.004;

export const BODY_FRAME_NOTE = "Body frame, metres: x aft from the nose tip, y sideways, z up. Convert to y-up before drawing.";

/** glTF colour factors are linear; our palette is written in sRGB. */
function srgbHexToLinear(hex: string): [number, number, number, number] {
  const channel = (offset: number): number => {
    const c = parseInt(hex.slice(offset, offset + 2), 16) / 255;
    return c <= 0.04045 ? c / 12.92 : Math.pow((c + 0.055) / 1.055, 2.4);
  };
  return [channel(1), channel(3), channel(5), 1];
}

function smoothNormals(mesh: MeshData): Float32Array<ArrayBuffer> {
  const { positions, indices } = mesh;
  const normals = new Float32Array(positions.length);
  for (let t = 0; t < indices.length; t += 3) {
    const a = indices[t] * 3,
      b = indices[t + 1] * 3,
      c = indices[t + 2] * 3;
    const ux = positions[b] - positions[a],
      uy = positions[b + 1] - positions[a + 1],
      uz = positions[b + 2] - positions[a + 2];
    const wx = positions[c] - positions[a],
      wy = positions[c + 1] - positions[a + 1],
      wz = positions[c + 2] - positions[a + 2];
    // Area-weighted face normal (not normalised) so that small pole triangles weigh little.
    const nx = uy * wz - uz * wy,
      ny = uz * wx - ux * wz,
      nz = ux * wy - uy * wx;
    for (const v of [a, b, c]) {
      normals[v] += nx;
      normals[v + 1] += ny;
      normals[v + 2] += nz;
    }
  }
  for (let v = 0; v < normals.length; v += 3) {
    const length = Math.hypot(normals[v], normals[v + 1], normals[v + 2]) || 1;
    normals[v] /= length;
    normals[v + 1] /= length;
    normals[v + 2] /= length;
  }
  return normals;
}

/** Fins are two-sided panels sharing corners; split them so each face gets its own flat normal. */
function flatFinBuffers(mesh: MeshData): { positions: Float32Array<ArrayBuffer>; normals: Float32Array<ArrayBuffer> } {
  const { positions: source, indices } = mesh;
  const positions = new Float32Array(indices.length * 3);
  const normals = new Float32Array(indices.length * 3);
  for (let t = 0; t < indices.length; t += 3) {
    const corners = [indices[t] * 3, indices[t + 1] * 3, indices[t + 2] * 3];
    const [a, b, c] = corners;
    const ux = source[b] - source[a],
      uy = source[b + 1] - source[a + 1],
      uz = source[b + 2] - source[a + 2];
    const wx = source[c] - source[a],
      wy = source[c + 1] - source[a + 1],
      wz = source[c + 2] - source[a + 2];
    let nx = uy * wz - uz * wy,
      ny = uz * wx - ux * wz,
      nz = ux * wy - uy * wx;
    const length = Math.hypot(nx, ny, nz) || 1;
    nx /= length;
    ny /= length;
    nz /= length;
    corners.forEach((corner, k) => {
      const out = (t + k) * 3;
      positions.set(source.subarray(corner, corner + 3), out);
      normals[out] = nx;
      normals[out + 1] = ny;
      normals[out + 2] = nz;
    });
  }
  return { positions, normals };
}

/** Seam lines follow every (segments / gores)-th meridian of the hull mesh, nudged outward. */
function seamLines(hull: MeshData, segments: number): { positions: Float32Array<ArrayBuffer>; indices: Uint16Array<ArrayBuffer> } {
  const ringCount = (hull.positions.length / 3 - 2) / segments;
  const step = Math.max(1, Math.round(segments / GORE_COUNT));
  const meridians: number[] = [];
  for (let j = 0; j < segments; j += step) meridians.push(j);
  const positions = new Float32Array(meridians.length * ringCount * 3);
  const indices = new Uint16Array(meridians.length * (ringCount - 1) * 2);
  let v = 0;
  let e = 0;
  meridians.forEach((j, m) => {
    for (let ring = 0; ring < ringCount; ring++) {
      const from = (ring * segments + j) * 3;
      positions[v++] = hull.positions[from];
      positions[v++] = hull.positions[from + 1] * (1 + SEAM_LIFT_FRACTION);
      positions[v++] = hull.positions[from + 2] * (1 + SEAM_LIFT_FRACTION);
      if (ring > 0) {
        indices[e++] = m * ringCount + ring - 1;
        indices[e++] = m * ringCount + ring;
      }
    }
  });
  return { positions, indices };
}

/** Smallest index type that fits, to keep the files small. */
function compactIndices(indices: Uint32Array, vertexCount: number): Uint16Array<ArrayBuffer> | Uint32Array<ArrayBuffer> {
  return vertexCount <= 0xffff ? Uint16Array.from(indices) : Uint32Array.from(indices);
}

export function buildEnvelopeDocument(key: string, params: Readonly<HullParams>): Document {
  const doc = new Document();
  doc.getRoot().getAsset().generator = "Trimrail scripts/models.ts";
  doc.getRoot().getAsset().extras = {
    trimrailModel: key,
    frame: "body",
    axes: { x: "aft from the nose tip", y: "sideways", z: "up" },
    units: "m",
    note: BODY_FRAME_NOTE,
  };
  const buffer = doc.createBuffer();
  const material = (name: string, hex: string, roughness: number): Material =>
    doc.createMaterial(name).setBaseColorFactor(srgbHexToLinear(hex)).setRoughnessFactor(roughness).setMetallicFactor(0);

  const hullMesh = buildHullMesh(params, MODEL_RESOLUTION);
  const hullVertexCount = hullMesh.positions.length / 3;
  const hullPrimitive = doc
    .createPrimitive()
    .setAttribute(
      "POSITION",
      doc.createAccessor("hull-position").setType("VEC3").setArray(Float32Array.from(hullMesh.positions)).setBuffer(buffer),
    )
    .setAttribute("NORMAL", doc.createAccessor("hull-normal").setType("VEC3").setArray(smoothNormals(hullMesh)).setBuffer(buffer))
    .setIndices(
      doc.createAccessor("hull-index").setType("SCALAR").setArray(compactIndices(hullMesh.indices, hullVertexCount)).setBuffer(buffer),
    )
    .setMaterial(material("envelope-fabric", "#d9dcdf", 0.9));

  const fins = flatFinBuffers(buildFinMesh(params));
  const finPrimitive = doc
    .createPrimitive()
    .setAttribute("POSITION", doc.createAccessor("fins-position").setType("VEC3").setArray(fins.positions).setBuffer(buffer))
    .setAttribute("NORMAL", doc.createAccessor("fins-normal").setType("VEC3").setArray(fins.normals).setBuffer(buffer))
    .setMaterial(material("fin-fabric", "#b9bec3", 0.9));

  const seams = seamLines(hullMesh, MODEL_RESOLUTION.segments);
  const seamPrimitive = doc
    .createPrimitive()
    .setMode(1) // LINES
    .setAttribute("POSITION", doc.createAccessor("seams-position").setType("VEC3").setArray(seams.positions).setBuffer(buffer))
    .setIndices(doc.createAccessor("seams-index").setType("SCALAR").setArray(seams.indices).setBuffer(buffer))
    .setMaterial(material("seam-tape", "#8e959c", 1));

  const envelope = doc
    .createNode("envelope_body_frame_x_aft_y_side_z_up")
    .setExtras({ note: BODY_FRAME_NOTE })
    .addChild(doc.createNode("hull").setMesh(doc.createMesh("hull").addPrimitive(hullPrimitive)))
    .addChild(doc.createNode("fins").setMesh(doc.createMesh("fins").addPrimitive(finPrimitive)))
    .addChild(doc.createNode("seams").setMesh(doc.createMesh("seams").addPrimitive(seamPrimitive)));
  doc.createScene(key).addChild(envelope);
  return doc;
}

/** The GLB bytes of a hull. WebIO needs no file system, so it runs in a route handler as in a script. */
export async function envelopeGlbBytes(key: string, params: Readonly<HullParams>): Promise<Uint8Array> {
  return new WebIO().writeBinary(buildEnvelopeDocument(key, params));
}
