import { z } from "zod";
import { COMMENT_MAX_LENGTH, DECISION_OUTCOMES, REVIEW_REASON_CODES, SEND_BACK_REASON_MIN_WORDS } from "@/lib/domain";
import { setupDraftSchema } from "@/lib/setups/setup-draft";

const id = z.string().min(1).max(64);
const version = z.number("version must be a number").int("version must be a whole number").min(1);

export const setupParamsSchema = z.object({ id });

/** A page of a list: 1-based, at most 100 rows. */
export const pageQuerySchema = z
  .object({
    page: z.coerce.number("page must be a number").int("page must be a whole number").min(1, "page starts at 1").max(1_000_000).default(1),
    pageSize: z.coerce
      .number("pageSize must be a number")
      .int("pageSize must be a whole number")
      .min(1)
      .max(100, "pageSize is at most 100")
      .default(25),
  })
  .strict();

/** A new setup: a whole draft, or the neutral start on one envelope model (named, or "New setup on …"). */
export const createSetupBodySchema = z
  .object({ draft: setupDraftSchema.optional(), modelId: id.optional(), name: setupDraftSchema.shape.name.optional() })
  .refine((body) => (body.draft === undefined) !== (body.modelId === undefined), {
    message: "Send either a draft or a modelId.",
    path: ["draft"],
  })
  .refine((body) => body.draft === undefined || body.name === undefined, {
    message: "A draft carries its own name; send the name inside it.",
    path: ["name"],
  })
  .transform((body) => (body.draft ? { draft: body.draft } : { modelId: body.modelId as string, name: body.name }));
export const saveSetupBodySchema = z.object({ version, draft: setupDraftSchema });
export const submitSetupBodySchema = z.object({ version, acknowledgeCautions: z.boolean().default(false) });

export const commentBodySchema = z.object({
  body: z
    .string("body must be text")
    .trim()
    .min(1, "Write something first.")
    .max(COMMENT_MAX_LENGTH, `At most ${COMMENT_MAX_LENGTH} characters.`),
});

const wordCount = (text: string) => text.split(/\s+/).filter(Boolean).length;

export const decisionBodySchema = z
  .object({
    decision: z.enum(DECISION_OUTCOMES, { message: "decision must be approved or changes_requested" }),
    reason: z.string("reason must be text").trim().max(COMMENT_MAX_LENGTH, `At most ${COMMENT_MAX_LENGTH} characters.`).default(""),
    reasonCodes: z
      .array(z.enum(REVIEW_REASON_CODES, { message: "unknown reason code" }))
      .max(REVIEW_REASON_CODES.length)
      .default([]),
    version,
  })
  .superRefine((body, ctx) => {
    if (body.decision === "changes_requested" && wordCount(body.reason) < SEND_BACK_REASON_MIN_WORDS) {
      ctx.addIssue({ code: "custom", path: ["reason"], message: "Say what should change, in at least a sentence." });
    }
  })
  .transform((body) => ({ ...body, reasonCodes: [...new Set(body.reasonCodes)] }));
