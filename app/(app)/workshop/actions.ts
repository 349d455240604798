"use server";
import { revalidatePath } from "next/cache";
import { z } from "zod";
import { roleChangeSchema, userIdSchema } from "@/app/api/users/[id]/role/schema";
import { setUserRole } from "@/db/queries/users";
import { MAKER_ONLY } from "@/lib/domain";
import { requireActionViewer } from "@/lib/auth/guard";
import { fail, issuesFromZod, ok, type Result } from "@/lib/errors";

const changeRoleInput = roleChangeSchema.extend({ userId: userIdSchema });

export async function changeRoleAction(input: z.input<typeof changeRoleInput>): Promise<Result<{ userId: string }>> {
  const parsed = changeRoleInput.safeParse(input);
  if (!parsed.success) return fail("bad_request", "Pick a role from the list.", issuesFromZod(parsed.error));
  const access = await requireActionViewer(MAKER_ONLY);
  if (!access.ok) return access;
  if (parsed.data.userId === access.data.id && parsed.data.role !== "maker") {
    return fail("bad_request", "You cannot take the maker role from your own account.");
  }
  const found = await setUserRole({ userId: parsed.data.userId, role: parsed.data.role, actorId: access.data.id });
  if (!found) return fail("not_found", "No such account.");
  revalidatePath("/workshop");
  return ok({ userId: parsed.data.userId });
}
