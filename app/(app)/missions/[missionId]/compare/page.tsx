import type { Metadata } from "next";
import Link from "next/link";
import { CompareView } from "@/components/review/compare-view";
import { comparePageData } from "@/server/review/pages";

export const metadata: Metadata = { title: "Compare revisions" };

export default async function ComparePage({
  params,
  searchParams,
}: {
  params: Promise<{ missionId: string }>;
  searchParams: Promise<{ from?: string; to?: string }>;
}) {
  const { missionId } = await params;
  const sp = await searchParams;
  const data = await comparePageData(missionId, sp.from, sp.to);
  return (
    <main className="mx-auto max-w-7xl px-6 py-6">
      <p className="text-sm">
        <Link className="text-sky-800 underline" href={`/missions/${missionId}`}>
          ← {data.mission?.name ?? "Mission"}
        </Link>
      </p>
      <h1 className="mt-2 text-2xl font-semibold text-slate-900">Compare revisions</h1>
      {data.mission && data.revisions.length > 0 ? (
        <form method="get" className="mt-3 flex flex-wrap items-end gap-3 text-sm">
          {(["from", "to"] as const).map((k) => (
            <label key={k} className="flex flex-col">
              <span className="font-medium">{k === "from" ? "Earlier revision" : "Later revision"}</span>
              <select
                name={k}
                defaultValue={String(data.result ? data.result[k].number : "")}
                className="rounded border border-slate-400 px-2 py-1"
              >
                {data.revisions.map((r) => (
                  <option key={r.number} value={r.number}>
                    {r.number} · {r.status} · {r.summary.slice(0, 60)}
                  </option>
                ))}
              </select>
            </label>
          ))}
          <button type="submit" className="rounded bg-slate-900 px-3 py-1.5 font-medium text-white">
            Compare
          </button>
        </form>
      ) : null}
      {data.problem ? (
        <p role="alert" className="mt-3 rounded border border-amber-300 bg-amber-50 px-3 py-2 text-sm text-amber-900">
          {data.problem}
        </p>
      ) : null}
      {data.result ? (
        <div className="mt-4">
          <CompareView {...data.result} />
        </div>
      ) : null}
    </main>
  );
}
