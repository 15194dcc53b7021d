import type { Metadata } from "next";
import { headers } from "next/headers";
import { CreateTeamForm } from "@/components/auth/create-team-form";
import { auth } from "@/server/auth/auth";
import { listTeamsOf } from "@/server/auth/queries";
import { switchTeamAction } from "../../../(app)/actions";
import { createTeamAction } from "./actions";

export const metadata: Metadata = { title: "Create a team" };

export default async function NewTeamPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const session = await auth.api.getSession({ headers: await headers() });
  const teams = session ? await listTeamsOf(session.user.id) : [];
  const { error } = await searchParams;
  return (
    <div className="flex flex-col gap-8">
      {error === "not-a-member" ? (
        <p role="alert" className="rounded border border-sev-error/40 bg-red-50 px-3 py-2 text-sm text-sev-error">
          You are not a member of that team (any more). Choose another one or create a team.
        </p>
      ) : null}
      {teams.length ? (
        <section className="rounded-md border border-ink/15 bg-white p-6">
          <h1 className="mb-3 text-xl font-semibold tracking-tight">Choose a team</h1>
          <ul className="flex flex-col gap-2">
            {teams.map((t) => (
              <li key={t.id}>
                <form
                  action={switchTeamAction}
                  className="flex items-center justify-between rounded border border-ink/15 px-3 py-2"
                >
                  <input type="hidden" name="teamId" value={t.id} />
                  <span className="text-sm">
                    <strong>{t.name}</strong> <span className="text-ink-soft">({t.role})</span>
                  </span>
                  <button type="submit" className="rounded border border-ink/30 px-3 py-1 text-sm hover:bg-ink-faint">
                    Open
                  </button>
                </form>
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      <section className="rounded-md border border-ink/15 bg-white p-6">
        <h2 className="mb-1 text-xl font-semibold tracking-tight">
          {teams.length ? "Or create a new team" : "Create your first team"}
        </h2>
        <p className="mb-5 text-sm leading-relaxed text-ink-soft">
          Missions, plans and reviews belong to a team. You become its owner and can invite others by e-mail as lead,
          engineer or viewer. If someone invited you, open the link in their e-mail instead.
        </p>
        <CreateTeamForm action={createTeamAction} />
      </section>
    </div>
  );
}
