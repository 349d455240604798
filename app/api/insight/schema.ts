import { z } from "zod";

const day = (name: string, role: string) =>
  z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, `${name} (${role}) must be a UTC date written yyyy-mm-dd`)
    .refine(
      (text) => !Number.isNaN(Date.parse(`${text}T00:00:00Z`)) && new Date(`${text}T00:00:00Z`).toISOString().startsWith(text),
      `${name} is not a calendar date`,
    )
    .optional();

/**
 * Insight's filters: an envelope model, and the UTC days the setups were created in, whole days with
 * both ends included (from=2026-11-01&to=2026-11-30 is all of November), as the Insight page sends them.
 */
export const insightQuerySchema = z
  .object({
    model: z.string().min(1).max(64).optional(),
    from: day("from", "the first day, included"),
    to: day("to", "the last day, included"),
  })
  .strict()
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: "from must not be after to (both days are included)", path: ["from"] })
  .transform((q) => ({ modelId: q.model ?? null, from: q.from ?? null, to: q.to ?? null }));
