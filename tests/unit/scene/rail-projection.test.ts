import { Group, Matrix4, PerspectiveCamera, Raycaster, Vector2, Vector3 } from "three";
import { describe, expect, it } from "vitest";
import { railXUnderPointer, type RailDragFrame } from "../../../components/scene/rail-projection";

// Reference: three.js's own ray from the camera (Raycaster.setFromCamera), taken into the body's
// frame, and the closest point of that ray to the rail line found by sampling the line densely.
function referenceRailX(ndc: Vector2, camera: PerspectiveCamera, body: Group, frame: RailDragFrame): number {
  const raycaster = new Raycaster();
  raycaster.setFromCamera(ndc, camera);
  const ray = raycaster.ray.clone().applyMatrix4(body.matrixWorld.clone().invert());
  let best = { s: Number.NaN, distance: Infinity };
  for (let s = frame.railStartX; s <= frame.railEndX; s += 1e-5) {
    const distance = ray.distanceToPoint(new Vector3(s, frame.railZ, 0));
    if (distance < best.distance) best = { s, distance };
  }
  return best.s;
}

describe("the rail position under the pointer, from plain matrices", () => {
  const camera = new PerspectiveCamera(35, 840 / 440, 0.01, 60);
  camera.position.set(2.1, 0.6, 3.4);
  camera.lookAt(0.7, -0.2, 0);
  camera.updateMatrixWorld();
  const pitched = new Group();
  pitched.position.set(0.62, -0.55, 0);
  pitched.rotation.z = -0.12; // about 7° nose up
  const body = new Group();
  body.position.set(-0.62, 0.55, 0);
  pitched.add(body);
  pitched.updateMatrixWorld(true);
  const frame: RailDragFrame = {
    worldFromNdc: new Matrix4().multiplyMatrices(camera.matrixWorld, camera.projectionMatrixInverse).toArray(),
    bodyFromWorld: body.matrixWorld.clone().invert().toArray(),
    railZ: -0.53,
    railStartX: 0.45,
    railEndX: 1.05,
  };

  it("agrees with three.js's ray and a dense search along the rail, within 0.1 mm", () => {
    for (const [x, y] of [
      [-0.2, -0.3],
      [0, -0.35],
      [0.15, -0.2],
      [0.05, 0.1],
    ]) {
      const ndc = new Vector2(x, y);
      const expected = referenceRailX(ndc, camera, body, frame);
      const got = railXUnderPointer(x, y, frame);
      expect(got).not.toBeNull();
      expect(Math.abs((got as number) - expected)).toBeLessThan(1e-4);
    }
  });

  it("clamps to the rail's ends and refuses a view straight along the rail", () => {
    expect(railXUnderPointer(-1, -0.3, frame)).toBe(0.45);
    expect(railXUnderPointer(1, -0.3, frame)).toBe(1.05);
    const along = new PerspectiveCamera(35, 1, 0.01, 60);
    along.position.set(-3, frame.railZ, 0);
    along.lookAt(0, frame.railZ, 0);
    along.updateMatrixWorld();
    const lookingAlong: RailDragFrame = {
      ...frame,
      worldFromNdc: new Matrix4().multiplyMatrices(along.matrixWorld, along.projectionMatrixInverse).toArray(),
      bodyFromWorld: new Matrix4().toArray(),
    };
    expect(railXUnderPointer(0, 0, lookingAlong)).toBeNull();
  });
});
