import { z } from "zod";
import { TEAM_ROLES } from "./auth";
import { paramTextSchema, withTextRule } from "./fields";

/**
 * Personal API tokens (docs/decisions/024-api-tokens.md): the form on the
 * account page and `POST /api/account/tokens` share this schema.
 */
export const TOKEN_LIMITS = {
  nameMax: 60,
  /** Days until a token expires: at least 1, at most 365 (the API-key plugin's bounds). */
  expiresInDays: { min: 1, max: 365, default: 90 },
  /** Requests per minute a token may make: the creator may lower it, never raise it above the cap. */
  requestsPerMinute: { min: 1, max: 600, default: 120 },
} as const;

const whole = (what: string, lim: { min: number; max: number }) =>
  z
    .number({ error: `${what} must be a whole number` })
    .int({ error: `${what} must be a whole number` })
    .min(lim.min, { error: `${what} must be at least ${lim.min}` })
    .max(lim.max, { error: `${what} must be at most ${lim.max}` });

export const createTokenSchema = z.object({
  name: withTextRule(
    z
      .string({ error: "Give the token a name." })
      .trim()
      .min(1, { error: "Give the token a name." })
      .max(TOKEN_LIMITS.nameMax, { error: `The name must be at most ${TOKEN_LIMITS.nameMax} characters.` }),
  ),
  teamId: paramTextSchema(200, "Choose a team.").min(1, { error: "Choose a team." }),
  role: z.enum(TEAM_ROLES, { error: "Choose a role: owner, lead, engineer or viewer." }),
  expiresInDays: whole("Days until expiry", TOKEN_LIMITS.expiresInDays).default(TOKEN_LIMITS.expiresInDays.default),
  requestsPerMinute: whole("Requests per minute", TOKEN_LIMITS.requestsPerMinute).default(
    TOKEN_LIMITS.requestsPerMinute.default,
  ),
});
export type CreateTokenInput = z.infer<typeof createTokenSchema>;

/** The JSON body of `POST /api/account/tokens`: the same fields, and no others (a form also sends React's own fields). */
export const createTokenRequestSchema = createTokenSchema.strict();

export const tokenIdSchema = z.object({
  tokenId: paramTextSchema(200, "The token is missing.").min(1, { error: "The token is missing." }),
});
