import type { Metadata } from "next";
import { MissionReport } from "@/components/workspace/report";
import { ReportApproval } from "@/components/review/report-approval";
import { approvalForReport } from "@/server/review/report";

export const metadata: Metadata = { title: "Plan report" };

export default async function MissionReportPage({ params }: { params: Promise<{ missionId: string }> }) {
  const { missionId } = await params;
  return (
    <main className="mx-auto max-w-7xl px-6 py-6">
      <MissionReport missionId={missionId} />
      <ReportApproval approval={await approvalForReport(missionId)} />
    </main>
  );
}
