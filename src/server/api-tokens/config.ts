import type { ApiKeyConfigurationOptions } from "@better-auth/api-key";
import { TOKEN_LIMITS } from "@/schemas/api-tokens";

/**
 * How personal API tokens are made and checked (docs/decisions/024-api-tokens.md).
 * The options of better-auth's API-key plugin, and the plugin's HTTP paths,
 * which are switched off: tokens are made, listed and revoked only through
 * our service, which binds each one to a team and a role.
 */

/** Every token starts with this; the rest is 64 random letters (the plugin's generator). */
export const TOKEN_PREFIX = "hl_";
export const TOKEN_RANDOM_LENGTH = 64;
/** The shape of a token; anything else is refused before the database is asked. */
export const TOKEN_PATTERN = /^hl_[A-Za-z]{64}$/;

/** The rate-limit window of every token (the count per window is chosen per token). */
export const TOKEN_WINDOW_MS = 60_000;

export const TOKEN_PLUGIN_OPTIONS = {
  defaultPrefix: TOKEN_PREFIX,
  defaultKeyLength: TOKEN_RANDOM_LENGTH,
  // The first characters (prefix included) are kept in clear so people can tell tokens apart.
  startingCharactersConfig: { shouldStore: true, charactersLength: 8 },
  requireName: true,
  maximumNameLength: TOKEN_LIMITS.nameMax,
  enableMetadata: true,
  keyExpiration: {
    defaultExpiresIn: TOKEN_LIMITS.expiresInDays.default * 86_400,
    minExpiresIn: TOKEN_LIMITS.expiresInDays.min,
    maxExpiresIn: TOKEN_LIMITS.expiresInDays.max,
  },
  rateLimit: {
    enabled: true,
    timeWindow: TOKEN_WINDOW_MS,
    maxRequests: TOKEN_LIMITS.requestsPerMinute.default,
  },
  // Never turn a token into a session: server actions and pages stay session-only.
  enableSessionForAPIKeys: false,
} satisfies ApiKeyConfigurationOptions;

/** The plugin's own endpoints under /api/auth, refused over HTTP (better-auth's `disabledPaths`). */
export const TOKEN_HTTP_PATHS = [
  "/api-key/create",
  "/api-key/get",
  "/api-key/update",
  "/api-key/delete",
  "/api-key/list",
] as const;
