"use client";

import Link from "next/link";
import { useMissionQuery } from "@/queries/missions";
import { LaserSafetyNote } from "./ui";
import { ChannelListUpload } from "./uploads/channel-list-upload";
import { DetectorResponseUpload } from "./uploads/detector-response-upload";
import { TuningMapUpload } from "./uploads/tuning-map-upload";

/** The uploads page of a mission: tuning map, channel list and detector response, each previewed before it is applied. */
export function UploadsPage({ missionId }: { missionId: string }) {
  const mission = useMissionQuery(missionId);
  return (
    <div className="space-y-4">
      <div>
        <p className="text-xs text-ink-soft">
          <Link href="/missions" className="hover:underline">
            Missions
          </Link>{" "}
          /{" "}
          <Link href={`/missions/${missionId}`} className="hover:underline">
            {mission.data?.name ?? "Mission"}
          </Link>{" "}
          /
        </p>
        <h1 className="text-2xl font-semibold tracking-tight">Upload measured data</h1>
        <p className="text-sm text-ink-soft">
          Each upload is previewed first; applying it saves a new plan revision and re-checks the plan.
        </p>
      </div>
      <TuningMapUpload missionId={missionId} />
      <ChannelListUpload missionId={missionId} />
      <DetectorResponseUpload missionId={missionId} />
      <LaserSafetyNote />
    </div>
  );
}
