import type { Metadata } from "next";
import { UploadsPage } from "@/components/workspace/uploads";
import { workspaceAbilities } from "../../_components/can";

export const metadata: Metadata = { title: "Uploads" };

export default async function MissionUploadsPage({ params }: { params: Promise<{ missionId: string }> }) {
  const { missionId } = await params;
  const { canEdit } = await workspaceAbilities();
  return (
    <main className="mx-auto max-w-5xl px-6 py-6">
      {canEdit ? (
        <UploadsPage missionId={missionId} />
      ) : (
        <p className="rounded bg-ink-faint px-3 py-2 text-sm">
          Your role in this team may read this mission but not upload data to it.
        </p>
      )}
    </main>
  );
}
