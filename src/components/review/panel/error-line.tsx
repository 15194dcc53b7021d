import type { ApiError } from "@/queries/api";

/** A failed query or mutation: its message and the issues it named. */
export function ErrorLine({ error }: { error: unknown }) {
  if (!error) return null;
  const e = error as ApiError;
  return (
    <div role="alert" className="mt-2 rounded border border-rose-300 bg-rose-50 px-3 py-2 text-sm text-rose-900">
      {e.message}
      {e.issues?.length ? (
        <ul className="mt-1 list-disc pl-5">
          {e.issues.map((i, n) => (
            <li key={n}>
              {i.path ? <code>{i.path}</code> : null} {i.message}
            </li>
          ))}
        </ul>
      ) : null}
    </div>
  );
}
