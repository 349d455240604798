import { z } from "zod";
import { setupDraftSchema } from "@/lib/setups/setup-draft";

const id = z.string().min(1).max(64);
const version = z.number("version must be a number").int("version must be a whole number").min(1);

export const setupParamsSchema = z.object({ id });

/** A new setup: a whole draft, or the neutral start on one envelope model. */
export const createSetupBodySchema = z
  .object({ draft: setupDraftSchema.optional(), modelId: id.optional() })
  .refine((body) => (body.draft === undefined) !== (body.modelId === undefined), { message: "Send either a draft or a modelId.", path: ["draft"] })
  .transform((body) => (body.draft ? { draft: body.draft } : { modelId: body.modelId as string }));
export const saveSetupBodySchema = z.object({ version, draft: setupDraftSchema });
export const submitSetupBodySchema = z.object({ version, acknowledgeCautions: z.boolean().default(false) });
