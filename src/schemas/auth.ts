import { z } from "zod";
import { paramTextSchema, withTextRule } from "./fields";

/**
 * One schema per auth form, shared by the conform form on the client and the
 * server action that re-parses the submission. Messages name the field.
 */
export const PASSWORD_MIN = 10;
export const PASSWORD_MAX = 128;
export const TEAM_ROLES = ["owner", "lead", "engineer", "viewer"] as const;

const email = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .toLowerCase()
  .max(254, "E-mail address is too long.")
  .pipe(z.email({ error: "E-mail address is not valid (expected name@example.org)." }));

const newPassword = z
  .string({ error: "Choose a password." })
  .min(PASSWORD_MIN, `Password must be at least ${PASSWORD_MIN} characters.`)
  .max(PASSWORD_MAX, `Password must be at most ${PASSWORD_MAX} characters.`);

export const SignUpSchema = z.object({
  name: withTextRule(
    z
      .string({ error: "Enter your name." })
      .trim()
      .min(1, "Enter your name.")
      .max(100, "Name is too long (100 characters at most)."),
  ),
  email,
  password: newPassword,
});

export const SignInSchema = z.object({
  email,
  password: z.string({ error: "Enter your password." }).min(1, "Enter your password."),
  next: z.string().max(2000).optional(),
});

export const ForgotPasswordSchema = z.object({ email });

export const ResetPasswordSchema = z
  .object({
    token: paramTextSchema(500, "The reset link is incomplete.").min(1, "The reset link is incomplete."),
    password: newPassword,
    confirm: z.string({ error: "Repeat the new password." }),
  })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], message: "The two passwords differ." });

export const ResendVerificationSchema = z.object({ email });

export const CreateTeamSchema = z.object({
  name: withTextRule(
    z
      .string({ error: "Enter a team name." })
      .trim()
      .min(2, "Team name must be at least 2 characters.")
      .max(80, "Team name is too long (80 characters at most)."),
  ),
});

export const InviteSchema = z.object({
  email,
  role: z.enum(TEAM_ROLES, { error: "Choose a role: owner, lead, engineer or viewer." }),
});

export const ChangeRoleSchema = z.object({
  memberId: paramTextSchema(200, "Member is missing.").min(1, "Member is missing."),
  role: z.enum(TEAM_ROLES, { error: "Choose a role: owner, lead, engineer or viewer." }),
});

export const MemberIdSchema = z.object({
  memberId: paramTextSchema(200, "Member is missing.").min(1, "Member is missing."),
});

export const SwitchTeamSchema = z.object({
  teamId: paramTextSchema(200, "Team is missing.").min(1, "Team is missing."),
});

/** An invitation id as a form or a path names it. */
export const InvitationIdSchema = z.object({
  invitationId: paramTextSchema(200, "The invitation is missing.").min(1, "The invitation is missing."),
});

/** A team slug from its name: lower-case ASCII words joined by hyphens, plus a short random suffix. */
export function slugFromName(name: string, suffix: string): string {
  const base = name
    .normalize("NFKD")
    .replace(/[\u0300-\u036f]/g, "")
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, "-")
    .replace(/^-+|-+$/g, "")
    .slice(0, 40);
  return `${base || "team"}-${suffix}`;
}
