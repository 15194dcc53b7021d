import type { Metadata } from "next";
import Link from "next/link";
import { CreateTokenForm, type TeamChoice } from "@/components/account/token-forms";
import { ActionButton } from "@/components/team/team-forms";
import { isRoleName } from "@/lib/permissions";
import { listTeamsOf } from "@/server/auth/queries";
import { requireSessionPage } from "@/server/auth/page-guard";
import { grantableRoles } from "@/server/api-tokens/roles";
import { listTokens } from "@/server/api-tokens/service";
import { createTokenAction, revokeTokenAction } from "./actions";
import { ListHead } from "@/components/shell/list-head";

export const metadata: Metadata = { title: "Account" };

const day = (iso: string | null) => (iso ? `${iso.slice(0, 16).replace("T", " ")} UTC` : "—");

export default async function AccountPage() {
  const session = await requireSessionPage("/account");
  const teams: TeamChoice[] = (await listTeamsOf(session.user.id)).flatMap((t) =>
    isRoleName(t.role) ? [{ id: t.id, name: t.name, role: t.role, grantable: grantableRoles(t.role) }] : [],
  );
  const tokens = await listTokens({ userId: session.user.id });
  return (
    <main className="mx-auto flex max-w-5xl flex-col gap-6 px-4 py-8">
      <header>
        <h1 className="text-2xl font-semibold tracking-tight">Account</h1>
        <p className="text-sm text-ink-soft">
          {session.user.name} · {session.user.email}
        </p>
      </header>

      <section className="rounded-md border border-ink/15 bg-white px-4 py-3">
        <h2 className="mb-1 text-sm font-semibold">Personal API tokens</h2>
        <p className="mb-3 text-sm text-ink-soft">
          A token lets a script or the <code>heterolane</code> command line call the{" "}
          <Link href="/api-reference" className="underline">
            HTTP API
          </Link>{" "}
          as you, in one team, with the role you give it (never above yours). Send it as{" "}
          <code>Authorization: Bearer …</code>, never in a URL. Only a hash is stored: copy the token when it is shown.
          The API reference lists every operation with its request and answer.
        </p>
        {teams.length ? (
          <CreateTokenForm action={createTokenAction} teams={teams} />
        ) : (
          <p className="text-sm">Join or create a team first.</p>
        )}
      </section>

      <section className="rounded-md border border-ink/15 bg-white">
        <h2 className="border-b border-ink/10 px-4 py-2.5 text-sm font-semibold">Your tokens ({tokens.length})</h2>
        {tokens.length ? (
          <table className="w-full text-sm" data-testid="token-table">
            <ListHead columns={["Name", "Starts with", "Team and role", "Per minute", "Expires", "Last used"]} />
            <tbody>
              {tokens.map((t) => (
                <tr key={t.id} className="border-t border-ink/10 align-middle" data-token-name={t.name}>
                  <td className="px-4 py-2">{t.name}</td>
                  <td className="px-4 py-2 font-mono text-xs">{t.start}…</td>
                  <td className="px-4 py-2">
                    {t.teamName} · <strong>{t.role}</strong>
                  </td>
                  <td className="px-4 py-2">{t.requestsPerMinute}</td>
                  <td className="px-4 py-2 text-ink-soft">{day(t.expiresAt)}</td>
                  <td className="px-4 py-2 text-ink-soft">{t.lastUsedAt ? day(t.lastUsedAt) : "never"}</td>
                  <td className="px-4 py-2">
                    <ActionButton
                      action={revokeTokenAction}
                      fields={{ tokenId: t.id }}
                      label="Revoke"
                      confirmText={`Revoke the token “${t.name}”? Scripts using it stop working at once.`}
                      danger
                    />
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        ) : (
          <p className="px-4 py-3 text-sm text-ink-soft">No tokens yet.</p>
        )}
      </section>
    </main>
  );
}
