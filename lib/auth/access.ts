import type { Role, UnitSystem } from "@/lib/domain";

export interface Viewer {
  id: string;
  name: string;
  email: string;
  role: Role;
  unitSystem: UnitSystem;
}

export type AccessVerdict = "ok" | "unauthenticated" | "forbidden";

/** Decides access from the session's viewer alone; every page, route and action asks this. */
export function checkAccess(viewer: Viewer | null, allowedRoles?: readonly Role[]): AccessVerdict {
  if (!viewer) return "unauthenticated";
  if (allowedRoles && !allowedRoles.includes(viewer.role)) return "forbidden";
  return "ok";
}
