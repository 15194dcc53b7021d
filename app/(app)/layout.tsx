import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { Providers } from "@/components/providers";
import { TopBar } from "@/components/shell/top-bar";
import { readActor } from "@/server/auth/guard";
import { listTeamsOf } from "@/server/auth/queries";
import { signOutAction, switchTeamAction } from "./actions";

/**
 * The signed-in app: a session and an active team are required (signed out →
 * /sign-in, no team → /teams/new). Pages and actions check roles again.
 */
export default async function AppLayout({ children }: { children: React.ReactNode }) {
  const { session, actor } = await readActor(await headers());
  if (!session) redirect("/sign-in");
  if (!actor) redirect("/teams/new");
  const teams = await listTeamsOf(session.user.id);
  return (
    <div className="flex min-h-screen flex-col">
      <TopBar
        user={{ name: session.user.name, email: session.user.email }}
        teams={teams}
        activeTeamId={actor.teamId}
        switchTeam={switchTeamAction}
        signOut={signOutAction}
      />
      <Providers>
        <div className="flex-1">{children}</div>
      </Providers>
    </div>
  );
}
