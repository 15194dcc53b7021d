import "server-only";
import { and, eq, sql } from "drizzle-orm";
import { db } from "@db/client";
import { apiTokenAddress, member, user } from "@db/schema";
import { isRoleName } from "@/lib/permissions";
import type { Actor } from "@/server/auth/actor";
import { auth } from "@/server/auth/auth";
import { clientAddress } from "@/server/auth/form-rate-limit";
import { writeActivity } from "@/server/core/activity";
import { inTransaction } from "@/server/core/db";
import { HttpError } from "@/server/core/http";
import { TOKEN_PATTERN } from "./config";
import { tokenMetadataSchema } from "./metadata";
import { lowerRole } from "./roles";

/**
 * Who a bearer token speaks for (docs/decisions/024-api-tokens.md). The
 * API-key plugin checks the token (its hash, expiry, revocation) and counts
 * the request against the token's rate limit; the token's metadata names
 * its team and role, capped by the creator's current role there (a creator
 * who left the team, or was demoted, takes the token down with them). A use
 * from an address the token has not been used from before writes one audit
 * row. No answer or log line ever contains the token.
 */

export interface TokenInfo {
  id: string;
  name: string;
}

const refuse = (code: string, message: string) => new HttpError(401, code, message);

export const malformedToken = () =>
  refuse(
    "invalid-token",
    "The Authorization header must be `Bearer <token>` with a Heterolane API token (hl_ and 64 letters).",
  );
const invalidToken = () =>
  refuse(
    "invalid-token",
    "This API token is not valid: it may be mistyped or revoked. Make a new one on the account page.",
  );
const expiredToken = () => refuse("token-expired", "This API token has expired. Make a new one on the account page.");

/** The token of an `Authorization: Bearer …` header, or a 401 for anything else. */
export function bearerToken(header: string): string {
  const m = /^Bearer[ ]+(\S+)\s*$/i.exec(header);
  if (!m || !TOKEN_PATTERN.test(m[1]!)) throw malformedToken();
  return m[1]!;
}

interface VerifyAnswer {
  valid: boolean;
  error: { code?: string; details?: { tryAgainIn?: number } } | null;
  key: { id: string; name: string | null; referenceId: string; metadata: unknown } | null;
}

/** The actor and token of a request whose Authorization header holds a bearer token; 401 or 429 otherwise. */
export async function readTokenCaller(request: Request): Promise<{ actor: Actor; token: TokenInfo }> {
  const key = bearerToken(request.headers.get("authorization") ?? "");
  const answer = (await auth.api.verifyApiKey({ body: { key } })) as VerifyAnswer;
  if (!answer.valid || !answer.key) {
    const code = answer.error?.code;
    if (code === "RATE_LIMITED") {
      const seconds = Math.max(1, Math.ceil((answer.error?.details?.tryAgainIn ?? 1000) / 1000));
      throw new HttpError(
        429,
        "rate-limited",
        `This API token made too many requests; try again in ${seconds} s.`,
        undefined,
        { retryAfterSeconds: seconds },
      );
    }
    if (code === "KEY_EXPIRED") throw expiredToken();
    throw invalidToken();
  }
  const meta = tokenMetadataSchema.safeParse(answer.key.metadata);
  if (!meta.success) throw invalidToken();
  const [row] = await db
    .select({ role: member.role, email: user.email, name: user.name })
    .from(member)
    .innerJoin(user, eq(user.id, member.userId))
    .where(and(eq(member.userId, answer.key.referenceId), eq(member.organizationId, meta.data.teamId)))
    .limit(1);
  if (!row || !isRoleName(row.role)) throw invalidToken();
  const actor: Actor = {
    userId: answer.key.referenceId,
    email: row.email,
    name: row.name,
    teamId: meta.data.teamId,
    role: lowerRole(meta.data.role, row.role),
  };
  const token = { id: answer.key.id, name: answer.key.name ?? "" };
  await noteAddress(token, clientAddress(request.headers), actor);
  return { actor, token };
}

/** Records the address a token is used from; the first use from each address writes one audit row. */
async function noteAddress(token: TokenInfo, address: string, actor: Actor): Promise<void> {
  await inTransaction(async (tx) => {
    const inserted = await tx
      .insert(apiTokenAddress)
      .values({ tokenId: token.id, address })
      .onConflictDoNothing()
      .returning({ at: apiTokenAddress.firstSeenAt });
    if (inserted.length === 0) return;
    const [{ n } = { n: 0 }] = await tx
      .select({ n: sql<number>`count(*)::int` })
      .from(apiTokenAddress)
      .where(eq(apiTokenAddress.tokenId, token.id));
    await writeActivity(tx, actor, {
      missionId: null,
      action: "token-use",
      entity: `token ${token.name}`,
      summary:
        Number(n) <= 1
          ? `API token "${token.name}" used for the first time, from ${address}.`
          : `API token "${token.name}" used from a new address, ${address}.`,
    });
  });
}
