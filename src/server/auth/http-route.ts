import "server-only";
import { readBodyBytes } from "@/server/core/body";
import { checkOrigin } from "@/server/core/guard";
import { HttpError, httpErrorResponse, unavailable } from "@/server/core/http";
import { isDatabaseUnreachable } from "@/server/core/unavailable";
import { checkDatabase } from "@/server/health";
import { consumeAccountSignIn } from "./form-rate-limit";

/** The largest body an auth API request may have (sign-up, sign-in, invitations: small JSON). */
export const AUTH_BODY_LIMIT = 64 * 1024;

type Handler = (request: Request) => Promise<Response>;

/**
 * Wraps better-auth's HTTP handler (app/api/auth/[...all]) in the server
 * core's rules: the cross-site check of every state-changing request (403
 * `cross-origin`, besides the library's own INVALID_ORIGIN), a body read
 * with the streaming limit (413 above 64 KB, never buffered whole), the
 * per-account sign-in limit (429, on top of better-auth's per-address one)
 * and 503 with Retry-After while the database is unreachable.
 */
export function authRoute(handler: Handler): Handler {
  return async (request) => {
    try {
      checkOrigin(request.method, request.headers);
      let forwarded = request;
      if (request.method !== "GET" && request.method !== "HEAD") {
        const bytes = await readBodyBytes(request, AUTH_BODY_LIMIT);
        if (new URL(request.url).pathname.endsWith("/sign-in/email")) {
          const wait = await accountWait(bytes);
          if (wait > 0) return tooManyForAccount(wait);
        }
        forwarded = new Request(request.url, {
          method: request.method,
          headers: request.headers,
          body: bytes.byteLength ? new Uint8Array(bytes) : null,
        });
      }
      const res = await handler(forwarded);
      if (res.status >= 500 && !(await checkDatabase())) return httpErrorResponse(unavailable());
      return res;
    } catch (err) {
      if (err instanceof HttpError) return httpErrorResponse(err);
      if (isDatabaseUnreachable(err)) return httpErrorResponse(unavailable());
      throw err;
    }
  };
}

/** The seconds to wait before this sign-in's account may try again (0: go ahead); a body without an address is left to better-auth. */
async function accountWait(bytes: Uint8Array): Promise<number> {
  let email: unknown;
  try {
    email = (JSON.parse(new TextDecoder().decode(bytes)) as { email?: unknown })?.email;
  } catch {
    return 0;
  }
  return typeof email === "string" && email.trim() !== "" ? consumeAccountSignIn(email) : 0;
}

function tooManyForAccount(wait: number): Response {
  return Response.json(
    {
      code: "TOO_MANY_REQUESTS",
      message: `Too many sign-in attempts for this account. Try again in ${wait} s.`,
    },
    { status: 429, headers: { "retry-after": String(wait), "x-retry-after": String(wait) } },
  );
}
