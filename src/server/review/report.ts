import "server-only";
import { desc, eq } from "drizzle-orm";
import { db } from "@db/client";
import { planRevisions } from "@db/schema";
import { getActor } from "@/server/auth/guard";
import { roleCan } from "@/lib/permissions";
import { HttpError } from "@/server/core/http";
import { getMissionRow } from "@/server/core/mission-scope";
import { getApproval } from "./overview";

/** The approval of the mission's newest revision for the report page, or null (no revision, no access). */
export async function approvalForReport(missionId: string) {
  const actor = await getActor();
  if (!actor || !roleCan(actor.role, { review: ["read"] })) return null;
  try {
    const m = await getMissionRow(actor, missionId);
    const [latest] = await db
      .select({ number: planRevisions.number })
      .from(planRevisions)
      .where(eq(planRevisions.missionId, m.id))
      .orderBy(desc(planRevisions.number))
      .limit(1);
    return latest ? await getApproval(m.id, latest.number) : null;
  } catch (e) {
    if (e instanceof HttpError) return null;
    throw e;
  }
}
