import type { Metadata } from "next";
import { MissionsList } from "@/components/workspace/missions-list";
import { workspaceAbilities } from "./_components/can";

export const metadata: Metadata = { title: "Missions" };

export default async function MissionsPage() {
  const { canCreateMission } = await workspaceAbilities();
  return <MissionsList canCreate={canCreateMission} />;
}
