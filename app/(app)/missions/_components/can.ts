import "server-only";
import { roleCan } from "@/lib/permissions";
import { getActor } from "@/server/auth/guard";

/**
 * What the signed-in person's role allows on the workspace screens. Only a
 * hint for showing controls: every write is checked again by the server.
 */
export async function workspaceAbilities() {
  const actor = await getActor();
  return {
    actor,
    canCreateMission: actor ? roleCan(actor.role, { mission: ["create"] }) : false,
    canEdit: actor ? roleCan(actor.role, { plan: ["edit"] }) : false,
    canDeleteMission: actor ? roleCan(actor.role, { mission: ["delete"] }) : false,
  };
}
