import { addComment, listComments } from "@/lib/server/review";
import { route } from "@/lib/server/route";
import { commentBodySchema, setupParamsSchema } from "../../schema";

const params = setupParamsSchema;

/** GET /api/setups/:id/comments — the thread (comments and decisions, oldest first); the owner, support, maker. */
export const GET = route({ params }, ({ viewer, params: { id } }) => listComments({ viewer, id }));

/** POST /api/setups/:id/comments — `{ body }`, 1–4,000 characters; mails the others in the thread. */
export const POST = route({ params, body: commentBodySchema, status: 201 }, ({ viewer, params: { id }, body }) =>
  addComment({ viewer, id, body: body.body }),
);
