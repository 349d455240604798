import { z } from "zod";
import { FLAG_LEVELS, QUEUE_SORTS, SETUP_STATUSES } from "@/lib/domain";

const optional = <T extends z.ZodType>(schema: T) => z.preprocess((v) => (v === "" || v === "any" ? undefined : v), schema.optional());

/** The review queue's query string; every part optional, with the desk's defaults. */
export const queueQuerySchema = z
  .object({
    status: z.preprocess(
      (v) => (v === undefined || v === "" ? "submitted" : v),
      z.enum([...SETUP_STATUSES, "any"], { message: `status must be one of ${SETUP_STATUSES.join(", ")} or any` }),
    ),
    worst: optional(z.enum(FLAG_LEVELS, { message: "worst must be ok, caution or stop" })),
    model: optional(z.string().min(1).max(64)),
    q: optional(z.string().trim().max(120, "search at most 120 characters")),
    sort: z.enum(QUEUE_SORTS, { message: `sort must be one of ${QUEUE_SORTS.join(", ")}` }).default("submittedAt"),
    dir: z.enum(["asc", "desc"], { message: "dir must be asc or desc" }).default("asc"),
    page: z.coerce.number("page must be a number").int("page must be a whole number").min(1, "page starts at 1").max(100_000).default(1),
    pageSize: z.coerce
      .number("pageSize must be a number")
      .int("pageSize must be a whole number")
      .min(1)
      .max(100, "pageSize is at most 100")
      .default(25),
  })
  .strict()
  .transform((query) => ({
    status: query.status === "any" ? null : query.status,
    worst: query.worst ?? null,
    modelId: query.model ?? null,
    q: query.q ? query.q : null,
    sort: query.sort,
    dir: query.dir,
    page: query.page,
    pageSize: query.pageSize,
  }));
