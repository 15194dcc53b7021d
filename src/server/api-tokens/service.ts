import "server-only";
import { and, desc, eq } from "drizzle-orm";
import { db } from "@db/client";
import { apikey, member, organization } from "@db/schema";
import { isRoleName, type RoleName } from "@/lib/permissions";
import type { CreateTokenInput } from "@/schemas/api-tokens";
import { auth } from "@/server/auth/auth";
import { authError } from "@/server/auth/errors";
import { writeActivity } from "@/server/core/activity";
import { forbidden, HttpError, invalidInput, notFound } from "@/server/core/http";
import { tokenMetadataSchema } from "./metadata";
import { roleWithin } from "./roles";
import { TOKEN_WINDOW_MS } from "./config";

/**
 * Personal API tokens (docs/decisions/024-api-tokens.md): made, listed and
 * revoked by the person who owns them, through better-auth's API-key plugin
 * (which generates the token, stores only its hash, and checks expiry and the
 * rate limit). Each token is bound to one team and a role no higher than its
 * creator's role there. Making and revoking a token write an audit row in
 * that team.
 */

export interface TokenOwner {
  userId: string;
  name: string;
}

/** A token as its owner sees it: never the secret, only its first characters. */
export interface TokenSummary {
  id: string;
  name: string;
  start: string;
  teamId: string;
  teamName: string;
  role: RoleName;
  requestsPerMinute: number;
  createdAt: string;
  expiresAt: string | null;
  lastUsedAt: string | null;
}

async function roleIn(userId: string, teamId: string): Promise<{ role: RoleName; teamName: string } | null> {
  const [row] = await db
    .select({ role: member.role, teamName: organization.name })
    .from(member)
    .innerJoin(organization, eq(organization.id, member.organizationId))
    .where(and(eq(member.userId, userId), eq(member.organizationId, teamId)))
    .limit(1);
  if (!row || !isRoleName(row.role)) return null;
  return { role: row.role, teamName: row.teamName };
}

const iso = (d: Date | null) => (d ? d.toISOString() : null);

/**
 * Makes a token. The secret is in the answer once and never again: the
 * plugin keeps only its SHA-256 hash. 400 naming `teamId` when the owner is
 * not a member of the team, 403 for a role above the owner's own.
 */
export async function createToken(
  owner: TokenOwner,
  input: CreateTokenInput,
): Promise<{ token: string; summary: TokenSummary }> {
  const membership = await roleIn(owner.userId, input.teamId);
  if (!membership) throw invalidInput([{ path: "teamId", message: "You are not a member of this team." }]);
  if (!roleWithin(input.role, membership.role))
    throw forbidden(`make a token with the role ${input.role} (your role in this team is ${membership.role})`);
  let created: { id: string; key: string; start: string | null; createdAt: Date; expiresAt: Date | null };
  try {
    created = await auth.api.createApiKey({
      body: {
        name: input.name,
        userId: owner.userId,
        expiresIn: input.expiresInDays * 86_400,
        rateLimitEnabled: true,
        rateLimitTimeWindow: TOKEN_WINDOW_MS,
        rateLimitMax: input.requestsPerMinute,
        metadata: { teamId: input.teamId, role: input.role },
      },
    });
  } catch (err) {
    const e = authError(err);
    if (e && e.status < 500) throw new HttpError(400, "invalid-input", e.message, [{ path: "", message: e.message }]);
    throw err;
  }
  const summary: TokenSummary = {
    id: created.id,
    name: input.name,
    start: created.start ?? "",
    teamId: input.teamId,
    teamName: membership.teamName,
    role: input.role,
    requestsPerMinute: input.requestsPerMinute,
    createdAt: created.createdAt.toISOString(),
    expiresAt: iso(created.expiresAt),
    lastUsedAt: null,
  };
  await writeActivity(
    db,
    { userId: owner.userId, name: owner.name, teamId: input.teamId },
    {
      missionId: null,
      action: "token-create",
      entity: `token ${input.name}`,
      summary: `Made API token "${input.name}" (${summary.start}…) with the role ${input.role}, ${input.requestsPerMinute} requests a minute, expiring ${summary.expiresAt?.slice(0, 10) ?? "never"}.`,
    },
  );
  return { token: created.key, summary };
}

/** The owner's tokens, newest first (expired ones are removed by the plugin as it meets them). */
export async function listTokens(owner: Pick<TokenOwner, "userId">): Promise<TokenSummary[]> {
  const rows = await db
    .select({
      id: apikey.id,
      name: apikey.name,
      start: apikey.start,
      metadata: apikey.metadata,
      rateLimitMax: apikey.rateLimitMax,
      createdAt: apikey.createdAt,
      expiresAt: apikey.expiresAt,
      lastRequest: apikey.lastRequest,
    })
    .from(apikey)
    .where(eq(apikey.referenceId, owner.userId))
    .orderBy(desc(apikey.createdAt));
  const teams = new Map(
    (await db.select({ id: organization.id, name: organization.name }).from(organization)).map((t) => [t.id, t.name]),
  );
  const out: TokenSummary[] = [];
  for (const r of rows) {
    const meta = tokenMetadataSchema.safeParse(parseJson(r.metadata));
    if (!meta.success) continue;
    out.push({
      id: r.id,
      name: r.name ?? "",
      start: r.start ?? "",
      teamId: meta.data.teamId,
      teamName: teams.get(meta.data.teamId) ?? "(team deleted)",
      role: meta.data.role,
      requestsPerMinute: r.rateLimitMax ?? 0,
      createdAt: r.createdAt.toISOString(),
      expiresAt: iso(r.expiresAt),
      lastUsedAt: iso(r.lastRequest),
    });
  }
  return out;
}

function parseJson(text: string | null): unknown {
  if (!text) return null;
  try {
    return JSON.parse(text);
  } catch {
    return null;
  }
}

/**
 * Revokes (deletes) one of the owner's tokens through the plugin, which
 * checks that the token is the caller's; 404 for any other id. `headers`
 * carry the owner's session.
 */
export async function revokeToken(owner: TokenOwner, tokenId: string, headers: Headers): Promise<{ revoked: string }> {
  const [row] = await db
    .select({ id: apikey.id, name: apikey.name, start: apikey.start, metadata: apikey.metadata })
    .from(apikey)
    .where(and(eq(apikey.id, tokenId), eq(apikey.referenceId, owner.userId)))
    .limit(1);
  if (!row) throw notFound("token");
  try {
    await auth.api.deleteApiKey({ body: { keyId: tokenId }, headers });
  } catch (err) {
    const e = authError(err);
    if (e && e.status === 404) throw notFound("token");
    throw err;
  }
  const meta = tokenMetadataSchema.safeParse(parseJson(row.metadata));
  if (meta.success)
    await writeActivity(
      db,
      { userId: owner.userId, name: owner.name, teamId: meta.data.teamId },
      {
        missionId: null,
        action: "token-revoke",
        entity: `token ${row.name ?? ""}`,
        summary: `Revoked API token "${row.name ?? ""}" (${row.start ?? ""}…).`,
      },
    );
  return { revoked: tokenId };
}
