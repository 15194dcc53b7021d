import type { Metadata } from "next";
import { MissionOverview } from "@/components/workspace/mission-overview";
import { workspaceAbilities } from "../_components/can";

export const metadata: Metadata = { title: "Mission" };

export default async function MissionPage({ params }: { params: Promise<{ missionId: string }> }) {
  const { missionId } = await params;
  const { canEdit } = await workspaceAbilities();
  return <MissionOverview missionId={missionId} canEdit={canEdit} />;
}
