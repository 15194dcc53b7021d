import "server-only";
import { getActor } from "@/server/auth/guard";
import { HttpError } from "@/server/core/http";
import { getMissionRow } from "@/server/core/mission-scope";

/**
 * Whether the mission pages of `missionId` have anything to show the
 * signed-in person: false for an id that is no mission of their team (the
 * page then answers 404, as the API does). Signed out counts as true: the
 * app layout sends the person to sign in first.
 */
export async function missionPageExists(missionId: string): Promise<boolean> {
  const actor = await getActor();
  if (!actor) return true;
  try {
    await getMissionRow(actor, missionId);
    return true;
  } catch (e) {
    if (e instanceof HttpError && e.status === 404) return false;
    throw e;
  }
}
