import type { Metadata } from "next";
import Link from "next/link";

export const metadata: Metadata = { title: "Not found" };

/** Any unknown address, and a mission that is not one of your team's. */
export default function NotFound() {
  return (
    <main className="mx-auto max-w-xl px-6 py-16">
      <h1 className="text-2xl font-semibold tracking-tight text-ink">Not found</h1>
      <p className="mt-2 text-sm text-ink-soft" data-testid="not-found">
        There is no such page, or the mission is not one of your team&apos;s (it may have been deleted, or it belongs to
        another team).
      </p>
      <p className="mt-4 text-sm">
        <Link href="/missions" className="underline">
          Back to the missions
        </Link>
      </p>
    </main>
  );
}
