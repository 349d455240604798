/**
 * Body frame (x aft from the nose tip, z up, y sideways) to three's y-up world, and the drawn
 * pitch. three.x = body x (aft to the right from the default camera), three.y = body z. Points
 * in the lifter's symmetry plane keep three.z = 0; the GLB is turned by −90° about x, a proper
 * rotation, so its triangle winding (and culling) survives.
 */
import type { SceneVec } from "./types";

export const DEG = Math.PI / 180;

/** Drawing only: where a body point lands after pitching by trimDeg (nose up +) about the tether
 *  point. Nose up lifts the nose (x = 0, to the left), i.e. a clockwise turn on screen. */
export function pitchedWorldPoint(point: SceneVec, tether: SceneVec, trimDeg: number): [number, number, number] {
  const angle = -trimDeg * DEG;
  const dx = point.x - tether.x;
  const dz = point.z - tether.z;
  const cos = Math.cos(angle);
  const sin = Math.sin(angle);
  return [tether.x + dx * cos - dz * sin, tether.z + dx * sin + dz * cos, 0];
}

/** The view's proportions all scale with the hull, so any envelope size frames the same way. */
export interface SceneScale {
  readonly lengthM: number;
  readonly groundY: number;
  readonly target: [number, number, number];
  readonly cameraPosition: [number, number, number];
  readonly minDistanceM: number;
  readonly maxDistanceM: number;
}

export function sceneScale(hullLengthM: number, hullMaxDiameterM: number, tether: SceneVec): SceneScale {
  const lengthM = Math.max(0.1, hullLengthM);
  const targetY = 0.5 * (0.5 * hullMaxDiameterM + tether.z);
  const target: [number, number, number] = [0.5 * lengthM, targetY, 0];
  return {
    lengthM,
    groundY: tether.z - 1.8 * lengthM,
    target,
    cameraPosition: [target[0] + 0.55 * lengthM, targetY + 0.35 * lengthM, 2.4 * lengthM],
    minDistanceM: 0.5 * lengthM,
    maxDistanceM: 8 * lengthM,
  };
}
