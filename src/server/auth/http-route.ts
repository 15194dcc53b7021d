import "server-only";
import { textProblem } from "@/schemas/fields";
import { formatPath, type Issue } from "@/schemas/issues";
import { decodeUtf8Strict, readBodyBytes } from "@/server/core/body";
import { checkOrigin, queryOf } from "@/server/core/guard";
import { HttpError, httpErrorResponse, invalidInput, unavailable } from "@/server/core/http";
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
 * with the streaming limit (413 above 64 KB, never buffered whole), strict
 * UTF-8 and the shared text rule on every string of a JSON body (400 naming
 * the field: a team or user name with a NUL would otherwise fail in the
 * database), the per-account sign-in limit (429, on top of better-auth's
 * per-address one) and 503 with Retry-After while the database is
 * unreachable.
 */
export function authRoute(handler: Handler): Handler {
  return async (request) => {
    try {
      checkOrigin(request.method, request.headers);
      const queryIssues = Object.entries(queryOf(request)).flatMap(([path, v]) => {
        const problem = textProblem(v);
        return problem ? [{ path, message: problem }] : [];
      });
      if (queryIssues.length) throw invalidInput(queryIssues, "The query of this request is not valid.");
      let forwarded = request;
      if (request.method !== "GET" && request.method !== "HEAD") {
        const bytes = await readBodyBytes(request, AUTH_BODY_LIMIT);
        const body = jsonOf(bytes);
        const issues: Issue[] = [];
        textIssues(body, [], issues);
        if (issues.length) throw invalidInput(issues, "Some fields are not valid.");
        if (new URL(request.url).pathname.endsWith("/sign-in/email")) {
          const wait = await accountWait(body);
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

/** The JSON value of a body (strict UTF-8: 400 otherwise), or undefined when it is empty or not JSON (better-auth answers that). */
function jsonOf(bytes: Uint8Array): unknown {
  if (bytes.byteLength === 0) return undefined;
  const text = decodeUtf8Strict(bytes);
  try {
    return JSON.parse(text);
  } catch {
    return undefined;
  }
}

/** Fields of the auth API that are one line of text (names, addresses, ids); others may hold tabs and line breaks. */
const SINGLE_LINE = new Set([
  "name",
  "email",
  "slug",
  "role",
  "organizationId",
  "invitationId",
  "memberId",
  "memberIdOrEmail",
  "userId",
  "token",
]);

/** Every string of a JSON value that breaks the shared text rule, with its path. */
function textIssues(value: unknown, path: (string | number)[], issues: Issue[]): void {
  if (typeof value === "string") {
    const key = path[path.length - 1];
    const problem = textProblem(value, { multiLine: !(typeof key === "string" && SINGLE_LINE.has(key)) });
    if (problem) issues.push({ path: formatPath(path), message: problem });
  } else if (Array.isArray(value)) value.forEach((v, i) => textIssues(v, [...path, i], issues));
  else if (value && typeof value === "object")
    for (const [k, v] of Object.entries(value)) textIssues(v, [...path, k], issues);
}

/** The seconds to wait before this sign-in's account may try again (0: go ahead); a body without an address is left to better-auth. */
async function accountWait(body: unknown): Promise<number> {
  const email = (body as { email?: unknown } | undefined)?.email;
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
