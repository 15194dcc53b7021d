import { ANY_MEMBER, guarded, json } from "@/server/core";
import { revokeToken } from "@/server/api-tokens/service";

/** Revokes one of the signed-in person's tokens (404 for any other id). Session only. */
export const DELETE = guarded(
  ANY_MEMBER,
  { what: "revoke tokens", params: ["tokenId"] },
  async ({ request, actor, params }) => json(await revokeToken(actor, params.tokenId, request.headers)),
);
