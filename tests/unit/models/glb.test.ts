import { readFileSync } from "node:fs";
import { NodeIO, type Document, type Primitive } from "@gltf-transform/core";
import { describe, expect, it } from "vitest";
import { integrateHullProfile } from "@/lib/balance/geometry";
import { demoHulls } from "@/lib/balance/geometry-envelope";
import { meshVolumeAndCentroid } from "@/lib/balance/geometry-mesh";
import { buildEnvelopeDocument, demoModelKeys, modelPath } from "@/scripts/models";

/** The mesh and the profile integral must agree within 0.5 % (design.md, balance engine). */
const RELATIVE_TOLERANCE = 0.005;

const io = new NodeIO();

async function readCommitted(key: string): Promise<Document> {
  return io.readBinary(new Uint8Array(readFileSync(modelPath(key as (typeof demoModelKeys)[number]))));
}

function primitiveOf(doc: Document, meshName: string): Primitive {
  const mesh = doc
    .getRoot()
    .listMeshes()
    .find((m) => m.getName() === meshName);
  if (!mesh) throw new Error(`no mesh named "${meshName}"`);
  return mesh.listPrimitives()[0];
}

function hullBuffers(doc: Document): { positions: Float32Array; indices: Uint32Array } {
  const primitive = primitiveOf(doc, "hull");
  const positions = primitive.getAttribute("POSITION")?.getArray();
  const indices = primitive.getIndices()?.getArray();
  if (!(positions instanceof Float32Array) || !indices) throw new Error("hull has no positions or indices");
  return { positions, indices: Uint32Array.from(indices) };
}

describe("public/models/*.glb", () => {
  it("holds one GLB per demo hull", () => {
    expect([...demoModelKeys].sort()).toEqual(["ridge-06", "ridge-11", "ridge-18"]);
  });

  for (const key of demoModelKeys) {
    describe(key, () => {
      const params = demoHulls[key];
      const expected = integrateHullProfile(params);

      it("returns the profile's gas volume and centre of buoyancy from the hull mesh within 0.5 %", async () => {
        const doc = await readCommitted(key);
        const { positions, indices } = hullBuffers(doc);
        const mesh = meshVolumeAndCentroid(positions, indices);
        expect(Math.abs(mesh.volumeM3 / expected.gasVolumeM3 - 1)).toBeLessThan(RELATIVE_TOLERANCE);
        expect(Math.abs(mesh.centroid.x / expected.buoyancyCentre.x - 1)).toBeLessThan(RELATIVE_TOLERANCE);
        expect(Math.abs(mesh.centroid.z - expected.buoyancyCentre.z)).toBeLessThan(RELATIVE_TOLERANCE * params.lengthM);
        expect(Math.abs(mesh.centroid.y)).toBeLessThan(RELATIVE_TOLERANCE * params.lengthM);
      });

      it("returns body-frame extents: nose tip at x = 0, tail at the hull length, radius in y and z", async () => {
        const doc = await readCommitted(key);
        const bounds = primitiveOf(doc, "hull").getAttribute("POSITION");
        const min = bounds?.getMin([0, 0, 0]) ?? [];
        const max = bounds?.getMax([0, 0, 0]) ?? [];
        expect(min[0]).toBeCloseTo(0, 6);
        expect(max[0]).toBeCloseTo(params.lengthM, 6);
        expect(max[2]).toBeCloseTo(params.maxDiameterM / 2, 2);
        expect(doc.getRoot().getAsset().extras).toMatchObject({ frame: "body", units: "m" });
      });

      it("has hull normals and thin fin panels", async () => {
        const doc = await readCommitted(key);
        const hull = primitiveOf(doc, "hull");
        expect(hull.getAttribute("NORMAL")?.getCount()).toBe(hull.getAttribute("POSITION")?.getCount());
        const fins = primitiveOf(doc, "fins");
        expect(fins.getAttribute("POSITION")?.getCount()).toBe(params.fins.count * 12);
      });

      it("is up to date: regenerating in memory gives the same vertex and index counts", async () => {
        const committed = await readCommitted(key);
        const fresh = await io.readBinary(await io.writeBinary(buildEnvelopeDocument(key, demoHulls[key])));
        for (const name of ["hull", "fins", "seams"]) {
          const a = primitiveOf(committed, name);
          const b = primitiveOf(fresh, name);
          expect(a.getAttribute("POSITION")?.getCount()).toBe(b.getAttribute("POSITION")?.getCount());
          expect(a.getIndices()?.getCount()).toBe(b.getIndices()?.getCount());
        }
        const first = hullBuffers(committed).positions;
        const regenerated = hullBuffers(fresh).positions;
        expect(Array.from(first.subarray(0, 30))).toEqual(Array.from(regenerated.subarray(0, 30)));
      });
    });
  }
});
