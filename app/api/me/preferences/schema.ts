import { z } from "zod";
import { UNIT_SYSTEMS } from "@/lib/domain";

export const preferencesSchema = z.object({ unitSystem: z.enum(UNIT_SYSTEMS, { message: "unitSystem must be metric or imperial" }) });
