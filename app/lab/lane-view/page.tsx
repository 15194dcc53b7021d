import { notFound } from "next/navigation";
import { LabLaneView } from "./_components/lab-lane-view";

export const metadata = { title: "Lane view lab" };
export const dynamic = "force-dynamic";

/**
 * Development page: the lane view of a plan named in the query
 * (`?plan=demo64`, `demoN`, `ex1`, `ex2`), checked in the browser, with no
 * database. For the lane view benchmark and for looking at the chart.
 * Not found in production unless HETEROLANE_DEV_MAIL=1.
 */
export default async function LaneViewLab({ searchParams }: { searchParams: Promise<{ plan?: string }> }) {
  if (process.env.NODE_ENV === "production" && process.env.HETEROLANE_DEV_MAIL !== "1") notFound();
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
