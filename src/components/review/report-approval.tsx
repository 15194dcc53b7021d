import { findingKeyText, reviewStateLabel, type ReviewState } from "@/lib/review";
import type { getApproval } from "@/server/review";

/**
 * The approval section of the printable plan report: which revision, its
 * review state, who submitted and who approved it, and the waivers it was
 * baselined with. Presentational; the report page loads the data on the
 * server (src/server/review getApproval).
 */
export type ReportApprovalData = NonNullable<Awaited<ReturnType<typeof getApproval>>>;

/** What the state means for the approval, after its label. */
const NOTE: Record<ReviewState, string> = {
  draft: " (not reviewed)",
  "in-review": " (not approved yet)",
  baselined: "",
  "changes-requested": " for rework (not approved)",
};

const day = (iso: string | null) => (iso ? `${iso.slice(0, 16).replace("T", " ")} UTC` : "–");

export function ReportApproval({ approval }: { approval: ReportApprovalData | null }) {
  return (
    <section
      aria-labelledby="approval-heading"
      className="mt-8 break-inside-avoid border-t-2 border-slate-800 pt-4"
      data-testid="report-approval"
    >
      <h2 id="approval-heading" className="text-lg font-semibold text-slate-900">
        Approval
      </h2>
      {!approval ? (
        <p className="mt-1 text-sm text-slate-700">This mission has no plan revision yet.</p>
      ) : (
        <>
          <dl className="mt-2 grid grid-cols-[max-content_1fr] gap-x-6 gap-y-1 text-sm">
            <dt className="font-medium text-slate-700">Revision</dt>
            <dd>{approval.revision}</dd>
            <dt className="font-medium text-slate-700">State</dt>
            <dd>
              {reviewStateLabel(approval.state)}
              {NOTE[approval.state]}
            </dd>
            <dt className="font-medium text-slate-700">Submitted by</dt>
            <dd>{approval.submittedBy ? `${approval.submittedBy}, ${day(approval.submittedAt)}` : "–"}</dd>
            <dt className="font-medium text-slate-700">Approved by</dt>
            <dd>{approval.approvedBy ? `${approval.approvedBy}, ${day(approval.approvedAt)}` : "not approved"}</dd>
            {approval.decisionNote ? (
              <>
                <dt className="font-medium text-slate-700">Decision note</dt>
                <dd>{approval.decisionNote}</dd>
              </>
            ) : null}
          </dl>
          <h3 className="mt-3 text-sm font-semibold text-slate-900">Waivers of error findings</h3>
          {approval.waivers.length === 0 ? (
            <p className="text-sm text-slate-700">
              {approval.state === "baselined"
                ? "None: the baseline had no open error finding."
                : "None recorded for an approval."}
            </p>
          ) : (
            <table className="mt-1 w-full border-collapse text-left text-sm">
              <thead>
                <tr className="border-b border-slate-400">
                  <th className="py-1 pr-3 font-medium">Finding</th>
                  <th className="py-1 pr-3 font-medium">Reason</th>
                  <th className="py-1 pr-3 font-medium">Waived by</th>
                  <th className="py-1 font-medium">When</th>
                </tr>
              </thead>
              <tbody>
                {approval.waivers.map((w) => (
                  <tr key={w.findingKey} className="border-b border-slate-200 align-top">
                    <td className="py-1 pr-3" title={w.findingKey}>
                      {findingKeyText(w.findingKey)}
                    </td>
                    <td className="py-1 pr-3">{w.reason}</td>
                    <td className="py-1 pr-3">{w.waivedByName}</td>
                    <td className="py-1">{day(w.waivedAt)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          )}
        </>
      )}
    </section>
  );
}
