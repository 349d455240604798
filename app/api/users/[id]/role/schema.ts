import { z } from "zod";
import { ROLES } from "@/lib/domain";

export const userParamsSchema = z.object({ id: z.string().min(1).max(64) });
export const roleChangeSchema = z.object({
  role: z.enum(ROLES, { message: `Role must be one of ${ROLES.join(", ")}.` }),
});
