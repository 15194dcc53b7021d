import type { Metadata } from "next";
import Link from "next/link";
import { MissionLanes } from "@/components/lane-view/mission-lanes";
import { workspaceAbilities } from "../../_components/can";

export const metadata: Metadata = { title: "Lane view" };

export default async function MissionLanesPage({ params }: { params: Promise<{ missionId: string }> }) {
  const { missionId } = await params;
  const { canEdit } = await workspaceAbilities();
  return (
    <main className="mx-auto max-w-[1500px] px-6 py-6">
      <div className="mb-3 flex items-baseline gap-3">
        <h1 className="text-xl font-semibold text-ink">Lane view</h1>
        <Link href={`/missions/${missionId}`} className="text-sm text-ink-soft underline">
          Back to the mission
        </Link>
      </div>
      <MissionLanes missionId={missionId} canEdit={canEdit} />
    </main>
  );
}
