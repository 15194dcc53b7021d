import type { Metadata } from "next";
import { MissionOverview } from "@/components/workspace/mission-overview";
import { ReviewPanel } from "@/components/review/review-panel";
import { reviewAbilities } from "@/server/review/abilities";
import { workspaceAbilities } from "../_components/can";

export const metadata: Metadata = { title: "Mission" };

export default async function MissionPage({ params }: { params: Promise<{ missionId: string }> }) {
  const { missionId } = await params;
  const { canEdit, canDeleteMission, actor } = await workspaceAbilities();
  return (
    <main className="mx-auto max-w-7xl px-6 py-6">
      <MissionOverview missionId={missionId} canEdit={canEdit} canDelete={canDeleteMission} />
      <ReviewPanel missionId={missionId} can={reviewAbilities(actor)} />
    </main>
  );
}
