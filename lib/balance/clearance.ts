/**
 * Clearance (design.md item 8). A payload's box is axis-aligned in the body frame, centred on its
 * centre of mass and on y = 0 (the lifter is symmetric). Both checks are exact for intersection:
 *  - hull: the box cuts the hull of revolution iff, for some x in its span, its point nearest the
 *    axis lies inside r(x); with one largest radius the worst x is the one nearest that station.
 *    The gap reported is vertical (at the same x), an upper bound of the straight-line gap.
 *  - tether: the line runs in the y = 0 plane from the tether point, so the test is a segment
 *    against the box's x–z rectangle.
 */
import { profileRadiusAt, type HullParams } from "./geometry";
import type { Vec } from "./vec";

export interface BoxSize {
  readonly lengthM: number;
  readonly widthM: number;
  readonly heightM: number;
}

/** Vertical gap between the box and the hull, m (≤ 0: the box cuts the hull). */
export function hullClearanceM(hull: Readonly<HullParams>, centre: Vec, size: BoxSize | undefined): number {
  const halfLength = 0.5 * (size?.lengthM ?? 0);
  const halfHeight = 0.5 * (size?.heightM ?? 0);
  const x0 = centre.x - halfLength;
  const x1 = centre.x + halfLength;
  const z0 = centre.z - halfHeight;
  const z1 = centre.z + halfHeight;
  const axisDistance = z0 > 0 ? z0 : z1 < 0 ? -z1 : 0;
  if (x1 < 0 || x0 > hull.lengthM) {
    // Wholly ahead of the nose or behind the tail: the gap to the nearer tip.
    const dx = x1 < 0 ? -x1 : x0 - hull.lengthM;
    return Math.hypot(dx, axisDistance);
  }
  const widest = hull.maxDiameterAtFraction * hull.lengthM;
  const worstX = Math.min(Math.max(widest, x0), x1);
  return axisDistance - profileRadiusAt(hull, worstX);
}

/**
 * Distance from the box to the tether line, m (0 when the line passes through the box).
 * The line leaves the tether point at angle `lineAngleRad` from the body's −z axis towards +x
 * (tether angle from vertical plus trim), for `lengthM`.
 */
export function tetherClearanceM(tetherPoint: Vec, lineAngleRad: number, lengthM: number, centre: Vec, size: BoxSize | undefined): number {
  const halfLength = 0.5 * (size?.lengthM ?? 0);
  const halfHeight = 0.5 * (size?.heightM ?? 0);
  const x0 = centre.x - halfLength,
    x1 = centre.x + halfLength;
  const z0 = centre.z - halfHeight,
    z1 = centre.z + halfHeight;
  const dx = Math.sin(lineAngleRad) * lengthM;
  const dz = -Math.cos(lineAngleRad) * lengthM;
  const px = tetherPoint.x,
    pz = tetherPoint.z;
  // Liang–Barsky clip of the segment against the rectangle: any overlap means contact.
  let tEnter = 0,
    tLeave = 1;
  const p = [-dx, dx, -dz, dz];
  const q = [px - x0, x1 - px, pz - z0, z1 - pz];
  let inside = true;
  for (let k = 0; k < 4 && inside; k++) {
    if (p[k] === 0) {
      if (q[k] < 0) inside = false;
    } else {
      const t = q[k] / p[k];
      if (p[k] < 0) {
        if (t > tLeave) inside = false;
        else if (t > tEnter) tEnter = t;
      } else {
        if (t < tEnter) inside = false;
        else if (t < tLeave) tLeave = t;
      }
    }
  }
  if (inside && tEnter <= tLeave) return 0;
  // Otherwise the nearest pair involves a rectangle corner or a segment end.
  const segmentLength2 = dx * dx + dz * dz;
  let best = Infinity;
  for (const [cx, cz] of [
    [x0, z0],
    [x0, z1],
    [x1, z0],
    [x1, z1],
  ] as const) {
    const t = segmentLength2 > 0 ? Math.min(1, Math.max(0, ((cx - px) * dx + (cz - pz) * dz) / segmentLength2)) : 0;
    best = Math.min(best, Math.hypot(px + t * dx - cx, pz + t * dz - cz));
  }
  for (const [ex, ez] of [
    [px, pz],
    [px + dx, pz + dz],
  ] as const) {
    const ox = ex < x0 ? x0 - ex : ex > x1 ? ex - x1 : 0;
    const oz = ez < z0 ? z0 - ez : ez > z1 ? ez - z1 : 0;
    best = Math.min(best, Math.hypot(ox, oz));
  }
  return best;
}
