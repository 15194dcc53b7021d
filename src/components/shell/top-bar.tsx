import Link from "next/link";
import { AccountMenu } from "./account-menu";
import { NavLinks } from "./nav-links";
import { TeamSwitcher, type TeamOption } from "./team-switcher";

export function TopBar({
  user,
  teams,
  activeTeamId,
  switchTeam,
  signOut,
  showNav = true,
}: {
  user: { name: string; email: string };
  teams: TeamOption[];
  activeTeamId: string | null;
  switchTeam: (formData: FormData) => Promise<void>;
  signOut: () => Promise<void>;
  showNav?: boolean;
}) {
  return (
    <header className="no-print bg-ink text-white">
      <div className="mx-auto flex h-12 max-w-7xl items-center gap-4 px-4">
        <Link href="/missions" className="font-semibold tracking-tight">
          Heterolane
        </Link>
        {teams.length ? <TeamSwitcher teams={teams} activeId={activeTeamId} action={switchTeam} /> : null}
        {showNav ? <NavLinks /> : null}
        <div className="ml-auto">
          <AccountMenu name={user.name} email={user.email} signOut={signOut} />
        </div>
      </div>
    </header>
  );
}
