/**
 * Where along the belly rail the pointer is: the pointer's ray, taken into the pitched lifter's
 * local frame, met with the rail line (the closest point between two lines). Plain numbers, no
 * three.js, so the page can answer a drag itself while a worker draws the view.
 */

/** What a drag needs of one frame; matrices column-major, as three.js keeps `elements`. */
export interface RailDragFrame {
  /** World from normalised device coordinates: the camera's world matrix × its inverse projection. */
  worldFromNdc: readonly number[];
  /** The lifter body's frame from world (three axes: x aft, y = body z). */
  bodyFromWorld: readonly number[];
  railZ: number;
  railStartX: number;
  railEndX: number;
}

/** Drag steps smaller than this (m) are not worth a store update. */
export const MIN_DRAG_STEP_M = 1e-5;

/** Below this, the view looks (almost) straight along the rail and the projection is ill-posed. */
const PARALLEL_EPSILON = 1e-6;

type Vec3 = [number, number, number];

function transformPoint(m: readonly number[], x: number, y: number, z: number): Vec3 {
  const w = m[3] * x + m[7] * y + m[11] * z + m[15];
  return [
    (m[0] * x + m[4] * y + m[8] * z + m[12]) / w,
    (m[1] * x + m[5] * y + m[9] * z + m[13]) / w,
    (m[2] * x + m[6] * y + m[10] * z + m[14]) / w,
  ];
}

/** Rail x under a pointer at (ndcX, ndcY), clamped to the rail; null when the view looks along it. */
export function railXUnderPointer(ndcX: number, ndcY: number, frame: RailDragFrame): number | null {
  const near = transformPoint(frame.bodyFromWorld, ...transformPoint(frame.worldFromNdc, ndcX, ndcY, -1));
  const far = transformPoint(frame.bodyFromWorld, ...transformPoint(frame.worldFromNdc, ndcX, ndcY, 1));
  const length = Math.hypot(far[0] - near[0], far[1] - near[1], far[2] - near[2]);
  if (!(length > 0)) return null;
  const d: Vec3 = [(far[0] - near[0]) / length, (far[1] - near[1]) / length, (far[2] - near[2]) / length];
  // Rail line: P(s) = (s, railZ, 0); ray: Q(t) = o + t·d with |d| = 1. Closest points solve
  // s = (b·e − w_x) / (1 − b²), with w = P(0) − o, b = d_x, e = d·w.
  const wx = -near[0];
  const wy = frame.railZ - near[1];
  const wz = -near[2];
  const b = d[0];
  const denom = 1 - b * b;
  if (denom < PARALLEL_EPSILON) return null;
  const e = d[0] * wx + d[1] * wy + d[2] * wz;
  const s = (b * e - wx) / denom;
  const low = Math.min(frame.railStartX, frame.railEndX);
  const high = Math.max(frame.railStartX, frame.railEndX);
  return Math.min(Math.max(s, low), high);
}
