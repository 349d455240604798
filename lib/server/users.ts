import "server-only";
import * as usersDb from "@/db/queries/users";
import type { Viewer } from "@/lib/auth/access";
import type { Role, UnitSystem } from "@/lib/domain";
import { fail, ok, type Result } from "@/lib/errors";

/** The maker gives an account a role. The maker cannot demote their own account (someone must keep the Workshop). */
export async function changeUserRole({
  viewer,
  userId,
  role,
}: {
  viewer: Viewer;
  userId: string;
  role: Role;
}): Promise<Result<{ id: string; role: Role }>> {
  if (userId === viewer.id && role !== "maker") {
    return fail("bad_request", "You cannot take the maker role from your own account.", [
      { path: "role", message: "own account keeps the maker role" },
    ]);
  }
  const found = await usersDb.setUserRole({ userId, role, actorId: viewer.id });
  return found ? ok({ id: userId, role }) : fail("not_found", "No such account.");
}

/** The caller's display units, remembered per account. */
export async function setUnitPreference({
  viewer,
  unitSystem,
}: {
  viewer: Viewer;
  unitSystem: UnitSystem;
}): Promise<Result<{ unitSystem: UnitSystem }>> {
  await usersDb.setUnitSystem({ userId: viewer.id, unitSystem });
  return ok({ unitSystem });
}
