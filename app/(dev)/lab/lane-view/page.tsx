import { requireDevRoutes } from "@/server/core/dev-routes";
import { LabLaneView } from "./_components/lab-lane-view";

export const metadata = { title: "Lane view lab" };
export const dynamic = "force-dynamic";

/**
 * Development page: the lane view of a generated demo plan named in the
 * query (`?plan=demo64`, `demoN` for N channels), checked in the browser,
 * with no database. For the lane view benchmark and for looking at the
 * chart. A development route (see the `(dev)` layout).
 */
export default async function LaneViewLab({ searchParams }: { searchParams: Promise<{ plan?: string }> }) {
  requireDevRoutes();
  const { plan } = await searchParams;
  return (
    <main className="mx-auto max-w-[1400px] p-4">
      <h1 className="mb-1 text-lg font-semibold text-ink">Lane view lab</h1>
      <p className="mb-4 text-xs text-ink-soft">
        Development page, no database. Demo data: every plan here is invented.
      </p>
      <LabLaneView name={plan ?? "demo64"} />
    </main>
  );
}
