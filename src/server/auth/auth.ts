import "server-only";
import { betterAuth } from "better-auth";
import { drizzleAdapter } from "better-auth/adapters/drizzle";
import { nextCookies } from "better-auth/next-js";
import { organization } from "better-auth/plugins";
import { apiKey } from "@better-auth/api-key";
import { db } from "@db/client";
import * as schema from "@db/schema";
import { ac, roles } from "@/lib/permissions";
import { CLIENT_ADDRESS_HEADER } from "@/server/core/client-address";
import { serverEnv, trustedOrigins } from "@/server/env";
import { listTeamsOf } from "./queries";
import { existingAccountMail, invitationMail, resetPasswordMail, sendMail, verificationMail } from "@/server/mail";
import { membershipAudit } from "@/server/team/membership-audit";
import { TOKEN_PLUGIN_OPTIONS, TOKEN_HTTP_PATHS } from "@/server/api-tokens/config";

/**
 * The one better-auth instance (docs/decisions/003-auth-and-roles.md).
 * Everything it keeps (users, sessions, verification tokens, teams, members,
 * invitations, rate-limit counters) lives in PostgreSQL, so app processes are
 * stateless and interchangeable.
 */
const env = serverEnv();

export const PASSWORD_MIN_LENGTH = 10;

export const auth = betterAuth({
  appName: "Heterolane",
  baseURL: env.BETTER_AUTH_URL,
  secret: env.BETTER_AUTH_SECRET,
  database: drizzleAdapter(db, { provider: "pg", schema }),
  // Pages of these origins may call the auth API (better-auth refuses others with INVALID_ORIGIN).
  trustedOrigins: trustedOrigins(env),
  advanced: {
    // The client address as the server core decided it from the socket and the trusted-proxy
    // setting (src/server/core/client-address.ts), for rate limits and session records;
    // never a header the client wrote.
    ipAddress: { ipAddressHeaders: [CLIENT_ADDRESS_HEADER] },
  },
  emailAndPassword: {
    enabled: true,
    minPasswordLength: PASSWORD_MIN_LENGTH,
    maxPasswordLength: 128,
    requireEmailVerification: true,
    revokeSessionsOnPasswordReset: true,
    resetPasswordTokenExpiresIn: 60 * 60,
    sendResetPassword: async ({ user, url }) => {
      await sendMail(resetPasswordMail(user.email, user.name, url));
    },
    // A sign-up through the API with a registered address gets a generic
    // answer (no probing of addresses); the owner of the address is told.
    onExistingUserSignUp: async ({ user }) => {
      const base = env.BETTER_AUTH_URL;
      await sendMail(
        existingAccountMail(
          user.email,
          user.name,
          new URL("/sign-in", base).toString(),
          new URL("/forgot-password", base).toString(),
        ),
      );
    },
  },
  emailVerification: {
    sendOnSignUp: true,
    sendOnSignIn: true,
    autoSignInAfterVerification: true,
    expiresIn: 60 * 60,
    sendVerificationEmail: async ({ user, url }) => {
      await sendMail(verificationMail(user.email, user.name, url));
    },
  },
  // Personal API tokens are made, listed and revoked only through our service
  // (src/server/api-tokens), which binds each to a team and a role; the
  // plugin's own HTTP endpoints are switched off (docs/decisions/024-api-tokens.md).
  disabledPaths: [...TOKEN_HTTP_PATHS],
  rateLimit: {
    enabled: env.HETEROLANE_AUTH_RATE_LIMIT !== "off",
    storage: "database",
    window: 60,
    max: 100,
    customRules: {
      "/sign-in/email": { window: 60, max: 10 },
      "/sign-up/email": { window: 60, max: 10 },
      "/request-password-reset": { window: 60, max: 5 },
      "/send-verification-email": { window: 60, max: 5 },
    },
  },
  // Every membership change (over HTTP or through auth.api) writes its audit row.
  hooks: { after: membershipAudit },
  databaseHooks: {
    session: {
      create: {
        // A new session starts in the person's first team, so a returning
        // member lands in a team rather than on the team picker.
        before: async (session) => {
          const teams = await listTeamsOf(session.userId);
          return { data: { ...session, activeOrganizationId: teams[0]?.id ?? null } };
        },
      },
    },
  },
  plugins: [
    organization({
      ac,
      roles,
      creatorRole: "owner",
      invitationExpiresIn: 48 * 60 * 60,
      cancelPendingInvitationsOnReInvite: true,
      sendInvitationEmail: async ({ id, email, role, organization: team, inviter }) => {
        const url = new URL(`/invitations/${id}`, env.BETTER_AUTH_URL).toString();
        await sendMail(invitationMail(email, inviter.user.name, team.name, role, url));
      },
    }),
    apiKey(TOKEN_PLUGIN_OPTIONS),
    nextCookies(),
  ],
});

export type Session = typeof auth.$Infer.Session;
