import { ATTACHMENT_NOT_FOUND, deleteAttachment, getAttachmentFile } from "@/lib/server/attachments";
import { route } from "@/lib/server/route";
import { attachmentParamsSchema } from "../schema";

const params = attachmentParamsSchema;
const notFoundMessage = ATTACHMENT_NOT_FOUND;

/** GET /api/attachments/:id — the file's bytes with its stored type; a PDF downloads, a photo may show inline. */
export const GET = route({ params, notFoundMessage, respond: "file" }, ({ viewer, params: { id } }) => getAttachmentFile({ viewer, id }));

/** DELETE /api/attachments/:id — the file's objects and its row; the setup's owner only. */
export const DELETE = route({ params, notFoundMessage, status: 204 }, ({ viewer, params: { id } }) => deleteAttachment({ viewer, id }));
