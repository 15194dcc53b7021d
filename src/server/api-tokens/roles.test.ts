import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { ROLE_NAMES, roleCan, type Permission, type RoleName } from "@/lib/permissions";
import { statements } from "@/lib/permissions";
import { grantableRoles, lowerRole, roleWithin } from "./roles";

// The order of the four roles, from docs/permissions.md (owner above lead above engineer above viewer):
// an independent, simpler statement of "no higher" than the permission-subset rule in roles.ts.
const RANK: Record<RoleName, number> = { owner: 3, lead: 2, engineer: 1, viewer: 0 };

describe("token roles", () => {
  it("known answers: who may make a token of which role", () => {
    expect(grantableRoles("owner")).toEqual(["owner", "lead", "engineer", "viewer"]);
    expect(grantableRoles("lead")).toEqual(["lead", "engineer", "viewer"]);
    expect(grantableRoles("engineer")).toEqual(["engineer", "viewer"]);
    expect(grantableRoles("viewer")).toEqual(["viewer"]);
  });

  it("agrees with the rank order of docs/permissions.md for every pair", () => {
    for (const a of ROLE_NAMES)
      for (const b of ROLE_NAMES) {
        expect(roleWithin(a, b)).toBe(RANK[a] <= RANK[b]);
        expect(lowerRole(a, b)).toBe(RANK[a] <= RANK[b] ? a : b);
      }
  });

  const role = fc.constantFrom(...ROLE_NAMES);
  const resource = fc.constantFrom(...(Object.keys(statements) as (keyof typeof statements)[]));

  it("property: a token's capped role never allows an action its creator's role does not", () => {
    fc.assert(
      fc.property(role, role, resource, fc.nat(10), (tokenRole, creatorRole, res, i) => {
        const actions = statements[res] as readonly string[];
        const action = actions[i % actions.length]!;
        const permission = { [res]: [action] } as Permission;
        const effective = lowerRole(tokenRole, creatorRole);
        if (roleCan(effective, permission)) expect(roleCan(creatorRole, permission)).toBe(true);
      }),
    );
  });

  it("property: lowerRole is symmetric and returns one of its arguments", () => {
    fc.assert(
      fc.property(role, role, (a, b) => {
        expect(lowerRole(a, b)).toBe(lowerRole(b, a));
        expect([a, b]).toContain(lowerRole(a, b));
      }),
    );
  });
});
