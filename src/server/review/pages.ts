import "server-only";
import { desc, eq } from "drizzle-orm";
import { db } from "@db/client";
import { planRevisions } from "@db/schema";
import { HttpError } from "@/server/core/http";
import { requirePageActor } from "@/server/auth/page-guard";
import { getMissionRow } from "@/server/core/mission-scope";
import { compareMissionRevisions } from "./compare";

/**
 * Data of the compare page: the mission's revisions and the comparison of
 * `from` → `to` (defaults: the baseline, or the revision before the newest,
 * against the newest). A bad or missing revision gives a message, not a crash.
 */
export async function comparePageData(missionId: string, fromRaw?: string, toRaw?: string) {
  const actor = await requirePageActor(`/missions/${missionId}/compare`);
  let mission;
  try {
    mission = await getMissionRow(actor, missionId);
  } catch (e) {
    if (e instanceof HttpError)
      return { mission: null, revisions: [], result: null, problem: "No such mission in your team." };
    throw e;
  }
  const revisions = await db
    .select({ number: planRevisions.number, status: planRevisions.status, summary: planRevisions.summary })
    .from(planRevisions)
    .where(eq(planRevisions.missionId, mission.id))
    .orderBy(desc(planRevisions.number));
  const newest = revisions[0]?.number;
  const baseline = revisions.find((r) => r.status === "baselined")?.number;
  const num = (s: string | undefined) => (s && /^[1-9]\d{0,8}$/.test(s) ? Number(s) : undefined);
  const from =
    num(fromRaw) ??
    (baseline !== undefined && baseline !== newest
      ? baseline
      : newest !== undefined
        ? Math.max(1, newest - 1)
        : undefined);
  const to = num(toRaw) ?? newest;
  const problems: string[] = [];
  if (fromRaw !== undefined && num(fromRaw) === undefined) problems.push("“from” must be a revision number.");
  if (toRaw !== undefined && num(toRaw) === undefined) problems.push("“to” must be a revision number.");
  if (from === undefined || to === undefined)
    return { mission, revisions, result: null, problem: problems.join(" ") || "This mission has no revisions yet." };
  try {
    return {
      mission,
      revisions,
      result: await compareMissionRevisions(mission.id, from, to),
      problem: problems.join(" ") || null,
    };
  } catch (e) {
    if (e instanceof HttpError)
      return { mission, revisions, result: null, problem: `${e.message} Choose revisions from the list.` };
    throw e;
  }
}
