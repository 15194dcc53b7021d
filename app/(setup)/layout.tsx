import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { TopBar } from "@/components/shell/top-bar";
import { auth } from "@/server/auth/auth";
import { listTeamsOf } from "@/server/auth/queries";
import { signOutAction, switchTeamAction } from "../(app)/actions";

/** Signed in, but not necessarily in a team yet (creating or choosing one). */
export default async function SetupLayout({ children }: { children: React.ReactNode }) {
  const session = await auth.api.getSession({ headers: await headers() });
  if (!session) redirect("/sign-in?next=/teams/new");
  const teams = await listTeamsOf(session.user.id);
  return (
    <div className="flex min-h-screen flex-col">
      <TopBar
        user={{ name: session.user.name, email: session.user.email }}
        teams={teams}
        activeTeamId={session.session.activeOrganizationId ?? null}
        switchTeam={switchTeamAction}
        signOut={signOutAction}
        showNav={false}
      />
      <main className="mx-auto w-full max-w-xl flex-1 px-4 py-10">{children}</main>
    </div>
  );
}
