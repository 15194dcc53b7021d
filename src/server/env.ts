import "server-only";
import { z } from "zod";
import { trustedOriginsFrom } from "./core/request-origin";

/**
 * The server's environment, validated once at first use. A missing or empty
 * value is an error naming the variable; there are no silent fallbacks for
 * secrets or URLs (README: Environment).
 */
const nonEmpty = (name: string) =>
  z
    .string({ error: `${name} is not set` })
    .trim()
    .min(1, `${name} is empty`);

const EnvSchema = z.object({
  DATABASE_URL: nonEmpty("DATABASE_URL"),
  BETTER_AUTH_SECRET: nonEmpty("BETTER_AUTH_SECRET").min(32, "BETTER_AUTH_SECRET must be at least 32 characters"),
  BETTER_AUTH_URL: z.url({ error: "BETTER_AUTH_URL must be an absolute URL such as http://localhost:3000" }),
  SMTP_URL: z.url({ error: "SMTP_URL must be a URL such as smtp://127.0.0.1:2525" }),
  MAIL_FROM: nonEmpty("MAIL_FROM"),
  NODE_ENV: z.enum(["development", "production", "test"]).optional(),
  HETEROLANE_AUTH_RATE_LIMIT: z.enum(["on", "off"]).optional(),
  HETEROLANE_DEV_ROUTES: z.enum(["0", "1"]).optional(),
  HETEROLANE_DEV_MAIL: z.enum(["0", "1"]).optional(),
  HETEROLANE_TRUSTED_PROXY_HOPS: z
    .string()
    .regex(/^\d$/, "HETEROLANE_TRUSTED_PROXY_HOPS must be a whole number from 0 to 9")
    .optional(),
  // Read by the engine pool (src/server/engine-pool), which checks it again; refused here at start-up.
  HETEROLANE_ENGINE_THREADS: z
    .string()
    .regex(/^([1-9]|[1-5]\d|6[0-4])$/, "HETEROLANE_ENGINE_THREADS must be a whole number from 1 to 64")
    .optional(),
  HETEROLANE_TRUSTED_ORIGINS: z
    .string()
    .optional()
    .refine(
      (v) => !v || v.split(",").every((o) => URL.canParse(o.trim()) && new URL(o.trim()).origin === o.trim()),
      "HETEROLANE_TRUSTED_ORIGINS must be a comma-separated list of origins such as https://plans.example.org",
    ),
});

export type ServerEnv = z.infer<typeof EnvSchema>;

/**
 * The origins whose pages may send state-changing requests: the public URL
 * (BETTER_AUTH_URL) and any listed in HETEROLANE_TRUSTED_ORIGINS. Shared by
 * the route and action guards and better-auth's own origin check.
 */
export function trustedOrigins(env: ServerEnv = serverEnv()): string[] {
  return trustedOriginsFrom(env.BETTER_AUTH_URL, env.HETEROLANE_TRUSTED_ORIGINS);
}

/** How many reverse proxies in front of the app append to X-Forwarded-For (0: none, the socket address is the client). */
export function trustedProxyHops(env: ServerEnv = serverEnv()): number {
  return Number(env.HETEROLANE_TRUSTED_PROXY_HOPS ?? "0");
}

let cached: ServerEnv | undefined;

export function serverEnv(): ServerEnv {
  if (cached) return cached;
  const parsed = EnvSchema.safeParse(process.env);
  if (!parsed.success) {
    const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`).join("\n");
    throw new Error(`Invalid server environment (see README: Environment):\n${lines}`);
  }
  cached = parsed.data;
  return cached;
}
