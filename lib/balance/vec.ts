/**
 * Plane vectors of the body frame: x along the envelope's axis from the nose tip, positive aft;
 * z up from the axis; metres. The lifter is symmetric in y, so the balance works in x–z.
 */
export interface Vec {
  readonly x: number;
  readonly z: number;
}

/** A point in space (metres), for meshes: x aft, y sideways, z up. */
export interface Vec3 {
  readonly x: number;
  readonly y: number;
  readonly z: number;
}

export function vec(x: number, z: number): Vec {
  return { x, z };
}

export function subtractVec(a: Vec, b: Vec): Vec {
  return { x: a.x - b.x, z: a.z - b.z };
}

export function addVec(a: Vec, b: Vec): Vec {
  return { x: a.x + b.x, z: a.z + b.z };
}
