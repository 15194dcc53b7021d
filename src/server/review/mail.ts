import "server-only";
import { sendMail, type OutgoingMail } from "@/server/mail";
import { serverEnv } from "@/server/env";

function esc(s: string): string {
  return s.replace(/[&<>"']/g, (c) => ({ "&": "&amp;", "<": "&lt;", ">": "&gt;", '"': "&quot;", "'": "&#39;" })[c]!);
}

function message(to: string, subject: string, lines: string[], path: string, label: string): OutgoingMail {
  const url = new URL(path, serverEnv().BETTER_AUTH_URL).toString();
  const footer = "You get this e-mail because of your notification settings in Heterolane (Settings → Notifications).";
  return {
    to,
    subject,
    text: `${lines.join("\n\n")}\n\n${label}: ${url}\n\n${footer}\n`,
    html: `<!doctype html><html><body style="font-family:system-ui,sans-serif;color:#12343b;max-width:560px">${lines
      .map((l) => `<p style="margin:0 0 12px;white-space:pre-wrap">${esc(l)}</p>`)
      .join(
        "",
      )}<p><a href="${esc(url)}">${esc(label)}</a></p><p style="font-size:13px;color:#2d545e">${esc(footer)}</p></body></html>`,
  };
}

export function reviewRequestedMail(
  to: string,
  p: { mission: string; missionId: string; revision: number; by: string; note: string; openErrors: number },
) {
  return message(
    to,
    `Submitted for review: ${p.mission}, revision ${p.revision}`,
    [
      `${p.by} submitted revision ${p.revision} of the plan "${p.mission}" for review.`,
      `Open error findings: ${p.openErrors}.`,
      ...(p.note ? [`Note: ${p.note}`] : []),
    ],
    `/missions/${p.missionId}`,
    "Open the mission",
  );
}

export function reviewDecidedMail(
  to: string,
  p: {
    mission: string;
    missionId: string;
    revision: number;
    by: string;
    decision: "baseline" | "request-changes";
    note: string;
  },
) {
  const what = p.decision === "baseline" ? "baselined" : "returned for rework";
  return message(
    to,
    `${p.decision === "baseline" ? "Baselined" : "Returned for rework"}: ${p.mission}, revision ${p.revision}`,
    [`${p.by} ${what} revision ${p.revision} of the plan "${p.mission}".`, ...(p.note ? [`Note: ${p.note}`] : [])],
    `/missions/${p.missionId}`,
    "Open the mission",
  );
}

export function reviewWithdrawnMail(
  to: string,
  p: { mission: string; missionId: string; revision: number; by: string; newRevision: number | null },
) {
  return message(
    to,
    `Review withdrawn: ${p.mission}, revision ${p.revision}`,
    [
      `${p.by} edited the plan "${p.mission}" while revision ${p.revision} was in review, so that review was withdrawn: there is nothing to decide until the plan is submitted again.`,
      p.newRevision === null
        ? "The edit is stored as a new draft revision."
        : `The edit is stored as draft revision ${p.newRevision}.`,
    ],
    `/missions/${p.missionId}`,
    "Open the mission",
  );
}

export function mentionMail(
  to: string,
  p: { mission: string; missionId: string; revision: number; by: string; body: string; target: string },
) {
  return message(
    to,
    `${p.by} mentioned you on ${p.mission}`,
    [`${p.by} mentioned you in a comment on ${p.target} of "${p.mission}" (revision ${p.revision}):`, p.body],
    `/missions/${p.missionId}`,
    "Open the mission",
  );
}

/** Sends each message; a failing delivery is logged and never undoes the review action that caused it. */
export async function deliver(mails: OutgoingMail[]): Promise<void> {
  for (const m of mails) {
    try {
      await sendMail(m);
    } catch (err) {
      console.error(`[review] mail to ${m.to} failed:`, err);
    }
  }
}
