import { createTokenRequestSchema } from "@/schemas/api-tokens";
import { ANY_MEMBER, guarded, json } from "@/server/core";
import { createToken, listTokens } from "@/server/api-tokens/service";

/**
 * The signed-in person's API tokens (docs/decisions/024-api-tokens.md).
 * Session only: outside /api/v1 the route guard refuses API tokens, so a
 * token can never make or list tokens.
 */
export const GET = guarded(ANY_MEMBER, { what: "list tokens" }, async ({ actor }) =>
  json({ tokens: await listTokens(actor) }, 200, { "cache-control": "no-store" }),
);

/** Makes a token; the answer holds the secret, once. */
export const POST = guarded(
  ANY_MEMBER,
  { what: "make tokens", body: createTokenRequestSchema, bodyLimit: 10_000, input: "token" },
  async ({ actor, body }) => json(await createToken(actor, body), 201, { "cache-control": "no-store" }),
);
