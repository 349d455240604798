/**
 * Integrals of a solid of revolution about the x axis, from its radius function r(x).
 *
 * The profile is replaced by a polyline through stations spaced by x = x0 + (x1 − x0)(1 − cos t)/2
 * with t evenly spaced: the stations crowd near the ends, where profiles like √(x) have infinite
 * slope, so the polyline error stays O(1/n²) everywhere. Each piece is an exact frustum.
 * Frustum formulas: volume πh(a² + ab + b²)/3, its centroid h(a² + 2ab + 3b²)/(4(a² + ab + b²))
 * from the a end; lateral area π(a + b)·slant, its centroid h(a + 2b)/(3(a + b)) from the a end
 * (CRC Standard Mathematical Tables, frustum of a cone).
 */

export type RadiusFunction = (xM: number) => number;

export interface RevolutionIntegrals {
  readonly volumeM3: number;
  /** x of the volume's centroid (on the axis, so z = 0). */
  readonly volumeCentroidXM: number;
  /** Lateral surface plus flat end discs where r(x0) or r(x1) is not zero. */
  readonly surfaceAreaM2: number;
  readonly surfaceCentroidXM: number;
  /** Side-view silhouette area 2∫r dx and its centroid x. */
  readonly planformAreaM2: number;
  readonly planformCentroidXM: number;
}

export const DEFAULT_PROFILE_STATIONS = 2000;

export function stationX(x0M: number, x1M: number, index: number, intervals: number): number {
  if (index <= 0) return x0M;
  if (index >= intervals) return x1M;
  return x0M + (x1M - x0M) * 0.5 * (1 - Math.cos((Math.PI * index) / intervals));
}

export function integrateRevolution(
  radiusAt: RadiusFunction,
  x0M: number,
  x1M: number,
  intervals: number = DEFAULT_PROFILE_STATIONS,
): RevolutionIntegrals {
  let volume = 0;
  let volumeMoment = 0;
  let lateral = 0;
  let lateralMoment = 0;
  let planform = 0;
  let planformMoment = 0;
  let xa = x0M;
  let ra = Math.max(0, radiusAt(x0M));
  const startRadius = ra;
  for (let i = 1; i <= intervals; i++) {
    const xb = stationX(x0M, x1M, i, intervals);
    const rb = Math.max(0, radiusAt(xb));
    const h = xb - xa;
    const sumSquares = ra * ra + ra * rb + rb * rb;
    const pieceVolume = (Math.PI * h * sumSquares) / 3;
    if (sumSquares > 0) {
      volume += pieceVolume;
      volumeMoment += pieceVolume * (xa + (h * (ra * ra + 2 * ra * rb + 3 * rb * rb)) / (4 * sumSquares));
    }
    const radiusSum = ra + rb;
    if (radiusSum > 0) {
      const sideCentroid = xa + (h * (ra + 2 * rb)) / (3 * radiusSum);
      const pieceLateral = Math.PI * radiusSum * Math.hypot(h, rb - ra);
      lateral += pieceLateral;
      lateralMoment += pieceLateral * sideCentroid;
      const piecePlanform = h * radiusSum;
      planform += piecePlanform;
      planformMoment += piecePlanform * sideCentroid;
    }
    xa = xb;
    ra = rb;
  }
  // Flat end discs close the solid where the profile does not come to a point.
  const startDisc = Math.PI * startRadius * startRadius;
  const endDisc = Math.PI * ra * ra;
  const surface = lateral + startDisc + endDisc;
  const surfaceMoment = lateralMoment + startDisc * x0M + endDisc * x1M;
  return {
    volumeM3: volume,
    volumeCentroidXM: volume > 0 ? volumeMoment / volume : 0.5 * (x0M + x1M),
    surfaceAreaM2: surface,
    surfaceCentroidXM: surface > 0 ? surfaceMoment / surface : 0.5 * (x0M + x1M),
    planformAreaM2: planform,
    planformCentroidXM: planform > 0 ? planformMoment / planform : 0.5 * (x0M + x1M),
  };
}
