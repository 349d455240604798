import { z } from "zod";

export const attachmentParamsSchema = z.object({ id: z.string().min(1).max(64) });
