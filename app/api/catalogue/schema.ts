import { z } from "zod";
import { hullParamsSchema } from "@/lib/balance";
import { catalogueIdSchema } from "@/lib/catalogue/schemas";

// The Workshop's routes share these; the item schemas themselves are lib/catalogue/schemas.ts,
// the same ones the Workshop's forms check with.
export {
  adapterValuesSchema,
  envelopeModelValuesSchema,
  envelopeUnitValuesSchema,
  liftTestValuesSchema,
  mountValuesSchema,
  pageQuerySchema,
  payloadTemplateValuesSchema,
} from "@/lib/catalogue/schemas";

export const itemParamsSchema = z.object({ id: catalogueIdSchema });
export const liftTestParamsSchema = z.object({ id: catalogueIdSchema, testId: catalogueIdSchema });
export const activeBodySchema = z.object({ active: z.boolean("active must be true or false") });
export const templatesImportBodySchema = z.object({
  csv: z.string("csv must be the file's text").min(1, "The file is empty.").max(200_000, "At most 200 000 characters; split the file."),
});

/** ?hull=<the hull parameters as JSON>, for the Workshop's live preview. */
export const hullPreviewQuerySchema = z.object({
  hull: z
    .string("hull must be the hull parameters as JSON")
    .max(4000)
    .transform((text, ctx) => {
      try {
        return JSON.parse(text) as unknown;
      } catch {
        ctx.addIssue({ code: "custom", message: "hull is not valid JSON" });
        return z.NEVER;
      }
    })
    .pipe(hullParamsSchema),
});
