import Link from "next/link";

export default function AuthLayout({ children }: { children: React.ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col items-center bg-ink-faint/40 px-4 py-10">
      <Link href="/" className="mb-8 text-xl font-semibold tracking-tight text-ink">
        Heterolane
      </Link>
      <main className="w-full max-w-md rounded-md border border-ink/15 bg-white p-6 shadow-sm">{children}</main>
    </div>
  );
}
