import { InviteSchema } from "@/schemas/auth";
import { guarded, json } from "@/server/core";
import { inviteMember } from "@/server/team/service";

/** Invites a person by e-mail with a role (lead or owner; only an owner may invite an owner). */
export const POST = guarded(
  { invitation: ["create"] },
  { what: "invite people", body: InviteSchema, bodyLimit: 10_000, input: "invitation" },
  async ({ request, actor, body }) => json(await inviteMember(actor, request.headers, body), 201),
);
