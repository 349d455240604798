import { z } from "zod";
import { setupDraftSchema } from "@/lib/setups/setup-draft";

export const setupIdSchema = z.string().min(1).max(64);
const version = z.number("version must be a number").int("version must be a whole number").min(1);

export const createSetupBodySchema = z.object({ draft: setupDraftSchema });
export const saveSetupBodySchema = z.object({ version, draft: setupDraftSchema });
export const submitSetupBodySchema = z.object({ version, acknowledgeCautions: z.boolean().default(false) });
