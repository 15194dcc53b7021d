import type { Metadata } from "next";
import { MissionsList } from "@/components/workspace/missions-list";
import { workspaceAbilities } from "./_components/can";

export const metadata: Metadata = { title: "Missions" };

export default async function MissionsPage() {
  const { canCreateMission } = await workspaceAbilities();
  return (
    <main className="mx-auto max-w-7xl px-6 py-6">
      <MissionsList canCreate={canCreateMission} />
    </main>
  );
}
