import { z } from "zod";

const day = (name: string) =>
  z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}$/, `${name} must be a date written yyyy-mm-dd`)
    .refine(
      (text) => !Number.isNaN(Date.parse(`${text}T00:00:00Z`)) && new Date(`${text}T00:00:00Z`).toISOString().startsWith(text),
      `${name} is not a calendar date`,
    )
    .optional();

/** Insight's filters: an envelope model, and a range of days the setups were created in (both ends included). */
export const insightQuerySchema = z
  .object({
    model: z.string().min(1).max(64).optional(),
    from: day("from"),
    to: day("to"),
  })
  .strict()
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: "from must not be after to", path: ["from"] })
  .transform((q) => ({
    modelId: q.model ?? null,
    from: q.from ? new Date(`${q.from}T00:00:00Z`) : null,
    // the whole of the last day
    to: q.to ? new Date(Date.parse(`${q.to}T00:00:00Z`) + 86_400_000) : null,
  }));
