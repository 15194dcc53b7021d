import type { Metadata } from "next";
import { headers } from "next/headers";
import { ActionButton, InviteForm, RoleSelectForm } from "@/components/team/team-forms";
import { roleCan, ROLE_NAMES } from "@/lib/permissions";
import { requirePageActor } from "@/server/auth/page-guard";
import { getTeam } from "@/server/team/service";
import { cancelInvitationAction, changeRoleAction, inviteAction, leaveTeamAction, removeMemberAction } from "./actions";
import { ListHead } from "@/components/shell/list-head";

export const metadata: Metadata = { title: "Team" };

const ROLE_TEXT: Record<string, string> = {
  owner: "everything, including roles, removing members and deleting missions",
  lead: "edits plans, decides reviews and waivers, invites people",
  engineer: "edits hardware, chains and channels, imports and exports, submits for review",
  viewer: "reads missions, plans, findings, reports and the audit trail",
};

export default async function TeamPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const { actor, team, members, invitations } = await getTeam(await requirePageActor("/team"), await headers());
  const { invited } = await searchParams;
  // Controls shown per role; every action is checked again on the server.
  const canInvite = roleCan(actor.role, { invitation: ["create"] });
  const canCancel = roleCan(actor.role, { invitation: ["cancel"] });
  const canManage = roleCan(actor.role, { member: ["update", "delete"] });
  const inviteRoles = actor.role === "owner" ? ROLE_NAMES : ROLE_NAMES.filter((r) => r !== "owner");

  return (
    <main className="mx-auto flex max-w-5xl flex-col gap-6 px-4 py-8">
      <header>
        <h1 className="text-2xl font-semibold tracking-tight">{team.name}</h1>
        <p className="text-sm text-ink-soft">
          You are <strong data-testid="my-role">{actor.role}</strong> in this team: {ROLE_TEXT[actor.role]}.
        </p>
      </header>

      {invited ? (
        <p role="status" className="rounded border border-sev-ok/40 bg-green-50 px-3 py-2 text-sm text-sev-ok">
          Invitation sent to {invited}.
        </p>
      ) : null}

      <section className="rounded-md border border-ink/15 bg-white">
        <h2 className="border-b border-ink/10 px-4 py-2.5 text-sm font-semibold">Members ({members.length})</h2>
        <table className="w-full text-sm">
          <ListHead columns={["Name", "E-mail", "Role"]} />
          <tbody>
            {members.map((m) => {
              const self = m.userId === actor.userId;
              return (
                <tr key={m.id} className="border-t border-ink/10 align-middle" data-member-email={m.email}>
                  <td className="px-4 py-2">
                    {m.name}
                    {self ? <span className="ml-1 text-ink-soft">(you)</span> : null}
                  </td>
                  <td className="px-4 py-2 text-ink-soft">{m.email}</td>
                  <td className="px-4 py-2">
                    {canManage ? (
                      <RoleSelectForm action={changeRoleAction} memberId={m.id} role={m.role} label={m.name} />
                    ) : (
                      <span data-role>{m.role}</span>
                    )}
                  </td>
                  <td className="px-4 py-2">
                    {self ? (
                      <ActionButton
                        action={leaveTeamAction}
                        fields={{}}
                        label="Leave team"
                        confirmText={`Leave ${team.name}?`}
                        danger
                      />
                    ) : canManage ? (
                      <ActionButton
                        action={removeMemberAction}
                        fields={{ memberId: m.id }}
                        label="Remove"
                        confirmText={`Remove ${m.name} from ${team.name}?`}
                        danger
                      />
                    ) : null}
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </section>

      {canInvite ? (
        <section className="rounded-md border border-ink/15 bg-white px-4 py-3">
          <h2 className="mb-3 text-sm font-semibold">Invite someone by e-mail</h2>
          <InviteForm action={inviteAction} roles={inviteRoles} />
          {invitations.length ? (
            <>
              <h3 className="mb-2 mt-4 text-xs font-semibold uppercase tracking-wide text-ink-soft">
                Pending invitations
              </h3>
              <ul className="flex flex-col divide-y divide-ink/10 text-sm">
                {invitations.map((i) => (
                  <li key={i.id} className="flex flex-wrap items-center justify-between gap-2 py-1.5">
                    <span>
                      {i.email} as <strong>{i.role}</strong>
                      <span className="ml-2 text-xs text-ink-soft">
                        expires {new Date(i.expiresAt).toISOString().slice(0, 16).replace("T", " ")} UTC
                      </span>
                    </span>
                    {canCancel ? (
                      <ActionButton
                        action={cancelInvitationAction}
                        fields={{ invitationId: i.id }}
                        label="Cancel invitation"
                      />
                    ) : null}
                  </li>
                ))}
              </ul>
            </>
          ) : null}
        </section>
      ) : (
        <p className="text-sm text-ink-soft">Only owners and leads can invite people to this team.</p>
      )}

      <section className="text-xs text-ink-soft">
        <h2 className="mb-1 font-semibold uppercase tracking-wide">Roles</h2>
        <ul className="grid gap-1 sm:grid-cols-2">
          {ROLE_NAMES.map((r) => (
            <li key={r}>
              <strong className="text-ink">{r}</strong>: {ROLE_TEXT[r]}
            </li>
          ))}
        </ul>
      </section>
    </main>
  );
}
