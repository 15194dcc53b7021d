import { getMissionRow, guarded, json, readJsonBody } from "@/server/workspace";
import { invalidInput, isUuid, parseOr400 } from "@/server/workspace/errors";
import { createComment, listComments } from "@/server/review";
import { createCommentSchema } from "@/schemas/review";

export const GET = guarded<"missionId">({ review: ["read"] }, "read comments", async ({ actor, params, query }) => {
  const m = await getMissionRow(actor, params.missionId);
  const issues = [];
  if (query.revision !== undefined && !/^[1-9]\d{0,8}$/.test(query.revision))
    issues.push({ path: "revision", message: "must be a revision number (1 or more)" });
  if (query.finding !== undefined && !isUuid(query.finding))
    issues.push({ path: "finding", message: "must be the id of a finding" });
  if (issues.length) throw invalidInput(issues, "The comment filter is not valid.");
  return json({
    comments: await listComments(m.id, {
      revision: query.revision !== undefined ? Number(query.revision) : undefined,
      channel: query.channel || undefined,
      finding: query.finding,
    }),
  });
});

export const POST = guarded<"missionId">({ review: ["comment"] }, "comment", async ({ request, actor, params }) => {
  const body = parseOr400(createCommentSchema, await readJsonBody(request, 50_000), "comment");
  return json(await createComment(actor, params.missionId, body), 201);
});
