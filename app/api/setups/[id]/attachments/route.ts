import { addAttachment, listAttachments } from "@/lib/server/attachments";
import { route } from "@/lib/server/route";
import { SETUP_NOT_FOUND } from "@/lib/server/setups";
import { setupParamsSchema } from "../../schema";

const params = setupParamsSchema;
const notFoundMessage = SETUP_NOT_FOUND;

/** GET /api/setups/:id/attachments — the setup's photos and datasheets: the owner, and staff once it was submitted. */
export const GET = route({ params, notFoundMessage }, ({ viewer, params: { id } }) => listAttachments({ viewer, setupId: id }));

/** POST /api/setups/:id/attachments — one file as multipart/form-data, streamed (≤ 10 MB, ≤ 20 per setup); the owner only. */
export const POST = route({ params, notFoundMessage, status: 201 }, ({ viewer, params: { id }, request }) =>
  addAttachment({ viewer, setupId: id, request }),
);
