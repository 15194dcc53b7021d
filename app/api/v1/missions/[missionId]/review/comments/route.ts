import { createCommentSchema } from "@/schemas/review";
import { getMissionRow, guarded, json } from "@/server/core";
import { commentsQuerySchema, createComment, listComments } from "@/server/review";

const params = ["missionId"] as const;

export const GET = guarded(
  { review: ["read"] },
  { what: "read comments", params, query: commentsQuerySchema, input: "comment filter" },
  async ({ actor, params, query }) => {
    const m = await getMissionRow(actor, params.missionId);
    return json({ comments: await listComments(m.id, query) });
  },
);

export const POST = guarded(
  { review: ["comment"] },
  { what: "comment", params, body: createCommentSchema, bodyLimit: 50_000, input: "comment" },
  async ({ actor, params, body }) => json(await createComment(actor, params.missionId, body), 201),
);
