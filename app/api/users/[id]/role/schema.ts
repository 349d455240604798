import { z } from "zod";
import { ROLES } from "@/lib/domain";

export const roleChangeSchema = z.object({
  role: z.enum(ROLES, { message: `Role must be one of ${ROLES.join(", ")}.` }),
});
export const userIdSchema = z.string().min(1).max(64);
