import { ATTACHMENT_NOT_FOUND, getAttachmentThumbnail } from "@/lib/server/attachments";
import { route } from "@/lib/server/route";
import { attachmentParamsSchema } from "../../schema";

/** GET /api/attachments/:id/thumbnail — a photo's small WebP (a PDF has none: 404). */
export const GET = route(
  { params: attachmentParamsSchema, notFoundMessage: ATTACHMENT_NOT_FOUND, respond: "file" },
  ({ viewer, params: { id } }) => getAttachmentThumbnail({ viewer, id }),
);
