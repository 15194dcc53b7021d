"use client";
import Link from "next/link";

/** Name, e-mail and sign-out in a small disclosure menu. */
export function AccountMenu({ name, email, signOut }: { name: string; email: string; signOut: () => Promise<void> }) {
  return (
    <details className="relative">
      <summary className="flex cursor-pointer list-none items-center gap-2 rounded px-2 py-1 text-sm text-white hover:bg-white/10">
        <span
          aria-hidden
          className="flex h-7 w-7 items-center justify-center rounded-full bg-white/20 text-xs font-semibold"
        >
          {initials(name)}
        </span>
        <span className="hidden sm:inline">{name}</span>
        <span className="sr-only">Account menu</span>
      </summary>
      <div className="absolute right-0 z-20 mt-1 w-64 rounded-md border border-ink/15 bg-white p-3 text-ink shadow-lg">
        <p className="truncate text-sm font-medium">{name}</p>
        <p className="mb-3 truncate text-xs text-ink-soft">{email}</p>
        <nav aria-label="Account" className="mb-3 flex flex-col gap-1 text-sm">
          <Link href="/account" className="rounded px-1 py-0.5 hover:bg-ink-faint">
            Account and API tokens
          </Link>
          <Link href="/api-reference" className="rounded px-1 py-0.5 hover:bg-ink-faint">
            API reference
          </Link>
        </nav>
        <form action={signOut}>
          <button type="submit" className="w-full rounded border border-ink/30 px-3 py-1.5 text-sm hover:bg-ink-faint">
            Sign out
          </button>
        </form>
      </div>
    </details>
  );
}

function initials(name: string): string {
  const parts = name
    .replace(/\(.*?\)/g, "")
    .trim()
    .split(/\s+/)
    .filter(Boolean);
  return ((parts[0]?.[0] ?? "?") + (parts.length > 1 ? (parts[parts.length - 1]?.[0] ?? "") : "")).toUpperCase();
}
