import type { Metadata } from "next";
import { headers } from "next/headers";
import Link from "next/link";
import { ActionButton } from "@/components/team/team-forms";
import { auth } from "@/server/auth/auth";
import { getInvitationSummary } from "@/server/auth/queries";
import { textProblem } from "@/schemas/fields";
import { signOutAction } from "../../../(app)/actions";
import { acceptInvitationAction, declineInvitationAction } from "./actions";

export const metadata: Metadata = { title: "Invitation" };

const button = "inline-block rounded bg-ink px-4 py-2 text-sm font-medium text-white";

/**
 * Where an invitation e-mail points. Every state gets a plain page: unknown,
 * already answered, cancelled, expired, for someone else, or ready to accept.
 * The invited address is shown only to the person signed in with it: the
 * link alone (forwarded, or left in a browser history) does not tell who
 * was invited.
 */
export default async function InvitationPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  // An id that cannot be an invitation's (control characters, absurd length) names none.
  const inv = textProblem(id) || id.length > 200 ? null : await getInvitationSummary(id);
  const here = `/invitations/${encodeURIComponent(id)}`;

  if (!inv) {
    return (
      <Notice title="This invitation does not exist" state="unknown">
        The link may be incomplete, or the invitation was replaced by a newer one. Ask the person who invited you to
        send it again.
      </Notice>
    );
  }
  if (inv.status !== "pending") {
    const what =
      inv.status === "accepted" ? "was already accepted" : inv.status === "canceled" ? "was cancelled" : "was declined";
    return (
      <Notice title={`This invitation ${what}`} state={inv.status}>
        {inv.status === "accepted" ? (
          <>
            Each invitation works once. If you accepted it, sign in and choose <strong>{inv.teamName}</strong> in the
            team switcher.
          </>
        ) : (
          <>
            Ask {inv.inviterName} for a new invitation to {inv.teamName} if you still need access.
          </>
        )}
        <div className="mt-5">
          <Link href="/sign-in" className={button}>
            Sign in
          </Link>
        </div>
      </Notice>
    );
  }
  if (inv.expiresAt < new Date()) {
    return (
      <Notice title="This invitation has expired" state="expired">
        Invitations are valid for 48 hours. Ask {inv.inviterName} to invite you to {inv.teamName} again.
      </Notice>
    );
  }

  const session = await auth.api.getSession({ headers: await headers() });
  const isInvitee = !!session && session.user.email.toLowerCase() === inv.email.toLowerCase();
  const intro = (
    <p className="mb-5 text-sm leading-relaxed">
      {inv.inviterName} invited {isInvitee ? <strong>{inv.email}</strong> : "an e-mail address"} to join{" "}
      <strong>{inv.teamName}</strong> as <strong>{inv.role}</strong>.
    </p>
  );

  if (!session) {
    const q = `next=${encodeURIComponent(here)}`;
    return (
      <>
        <h1 className="mb-3 text-2xl font-semibold tracking-tight" data-invitation-state="signed-out">
          Join {inv.teamName}
        </h1>
        {intro}
        <p className="mb-5 text-sm text-ink-soft">
          Sign in with the address the invitation was sent to, or create an account for it, to accept.
        </p>
        <div className="flex gap-3">
          <Link href={`/sign-in?${q}`} className={button}>
            Sign in
          </Link>
          <Link href={`/sign-up?${q}`} className="inline-block rounded border border-ink px-4 py-2 text-sm font-medium">
            Create an account
          </Link>
        </div>
      </>
    );
  }

  if (!isInvitee) {
    return (
      <>
        <h1 className="mb-3 text-2xl font-semibold tracking-tight" data-invitation-state="other-account">
          This invitation is for another address
        </h1>
        {intro}
        <p className="mb-5 text-sm">
          You are signed in as <strong>{session.user.email}</strong>. Sign out, then sign in with the address the
          invitation was sent to.
        </p>
        <form action={signOutAction}>
          <button type="submit" className={button}>
            Sign out
          </button>
        </form>
      </>
    );
  }

  return (
    <>
      <h1 className="mb-3 text-2xl font-semibold tracking-tight" data-invitation-state="ready">
        Join {inv.teamName}
      </h1>
      {intro}
      <div className="flex flex-wrap items-start gap-3">
        <ActionButton
          action={acceptInvitationAction}
          fields={{ invitationId: inv.id }}
          label="Accept and join the team"
          large
        />
        <ActionButton action={declineInvitationAction} fields={{ invitationId: inv.id }} label="Decline" danger large />
      </div>
    </>
  );
}

function Notice({ title, state, children }: { title: string; state: string; children: React.ReactNode }) {
  return (
    <>
      <h1 className="mb-3 text-2xl font-semibold tracking-tight" data-invitation-state={state}>
        {title}
      </h1>
      <div className="text-sm leading-relaxed">{children}</div>
    </>
  );
}
