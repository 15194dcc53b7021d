import { ChangeRoleSchema } from "@/schemas/auth";
import { guarded, json } from "@/server/core";
import { changeMemberRole, removeMember } from "@/server/team/service";

const params = ["memberId"] as const;

/** Changes a member's role (owner only). Body: { role }. */
export const PATCH = guarded(
  { member: ["update"] },
  {
    what: "change roles",
    params,
    body: ChangeRoleSchema.pick({ role: true }),
    bodyLimit: 10_000,
    input: "role change",
  },
  async ({ request, actor, params, body }) =>
    json(await changeMemberRole(actor, request.headers, { memberId: params.memberId, role: body.role })),
);

/** Removes a member from the team (owner only; never the last owner). */
export const DELETE = guarded(
  { member: ["delete"] },
  { what: "remove members", params },
  async ({ request, actor, params }) => json(await removeMember(actor, request.headers, { memberId: params.memberId })),
);
