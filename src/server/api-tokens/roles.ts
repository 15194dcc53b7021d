import { ROLE_NAMES, roleCan, roles, type Permission, type RoleName } from "@/lib/permissions";

/** Every action a role allows, as a permission (resources it allows nothing of are left out). */
function permissionOf(role: RoleName): Permission {
  const statements = roles[role].statements as unknown as Record<string, readonly string[]>;
  return Object.fromEntries(Object.entries(statements).filter(([, actions]) => actions.length > 0)) as Permission;
}

/**
 * True when `tokenRole` allows nothing that `creatorRole` does not: a token's
 * role is never higher than its creator's role in the team.
 */
export function roleWithin(tokenRole: RoleName, creatorRole: RoleName): boolean {
  return roleCan(creatorRole, permissionOf(tokenRole));
}

/** The roles a member with `role` may give a token, highest first. */
export function grantableRoles(role: RoleName): RoleName[] {
  return ROLE_NAMES.filter((r) => roleWithin(r, role));
}

/** The lower of two roles (the token's role, capped by the creator's current role). */
export function lowerRole(a: RoleName, b: RoleName): RoleName {
  return roleWithin(a, b) ? a : b;
}
