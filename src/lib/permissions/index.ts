/**
 * Who may do what in a team. One set of access-control statements (resource →
 * actions) and one role object per role, shared by the better-auth server
 * plugin, the client plugin and Heterolane's own route guards. Hiding a
 * control in the UI is a hint; the server checks these on every request.
 *
 * Roles (docs/permissions.md):
 * - viewer: reads missions, plans, findings, reports and the audit trail.
 * - engineer: edits hardware, chains and channels; imports and exports; submits
 *   a plan for review; comments.
 * - lead: what an engineer may, plus deciding reviews (baseline, request
 *   changes), recording waivers, and inviting people to the team.
 * - owner: everything, including member roles, removal, deleting missions and
 *   the team itself.
 */
import { createAccessControl } from "better-auth/plugins/access";
import { defaultStatements } from "better-auth/plugins/organization/access";

export const statements = {
  ...defaultStatements,
  mission: ["read", "create", "update", "delete"],
  plan: ["read", "edit", "import", "export"],
  review: ["read", "comment", "submit", "decide", "waive"],
  audit: ["read", "export"],
} as const;

export const ac = createAccessControl(statements);

const read = {
  mission: ["read"],
  plan: ["read", "export"],
  review: ["read"],
  audit: ["read"],
} as const;

export const viewer = ac.newRole({
  ...read,
  organization: [],
  member: [],
  invitation: [],
  team: [],
  ac: ["read"],
});

export const engineer = ac.newRole({
  mission: ["read", "create", "update"],
  plan: ["read", "edit", "import", "export"],
  review: ["read", "comment", "submit"],
  audit: ["read", "export"],
  organization: [],
  member: [],
  invitation: [],
  team: [],
  ac: ["read"],
});

export const lead = ac.newRole({
  mission: ["read", "create", "update"],
  plan: ["read", "edit", "import", "export"],
  review: ["read", "comment", "submit", "decide", "waive"],
  audit: ["read", "export"],
  organization: [],
  member: [],
  invitation: ["create", "cancel"],
  team: [],
  ac: ["read"],
});

export const owner = ac.newRole({
  mission: ["read", "create", "update", "delete"],
  plan: ["read", "edit", "import", "export"],
  review: ["read", "comment", "submit", "decide", "waive"],
  audit: ["read", "export"],
  organization: ["update", "delete"],
  member: ["create", "update", "delete"],
  invitation: ["create", "cancel"],
  team: ["create", "update", "delete"],
  ac: ["create", "read", "update", "delete"],
});

export const roles = { owner, lead, engineer, viewer } as const;
export type RoleName = keyof typeof roles;
export const ROLE_NAMES: readonly RoleName[] = ["owner", "lead", "engineer", "viewer"];

export type Statements = typeof statements;
export type Resource = keyof Statements;
export type Permission = { [R in Resource]?: Statements[R][number][] };

export function isRoleName(value: unknown): value is RoleName {
  return typeof value === "string" && (ROLE_NAMES as readonly string[]).includes(value);
}

/** True when `role` may perform every action listed in `permission`. */
export function roleCan(role: RoleName, permission: Permission): boolean {
  // better-auth's Role.authorize returns { success } synchronously.
  const result = roles[role].authorize(permission as never);
  return result.success;
}
