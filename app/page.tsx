import Link from "next/link";

export default function Landing() {
  return (
    <main className="mx-auto flex min-h-screen max-w-3xl flex-col justify-center gap-6 px-6">
      <h1 className="text-4xl font-semibold tracking-tight">Heterolane</h1>
      <p className="text-lg leading-relaxed text-ink-soft">
        Plan every channel of a microwave-photonic radiometer (RF band, resonator mode, LO offset and IF slot) and
        prove, on every change, that no image, spur or drift lands on a channel.
      </p>
      <div className="flex gap-3">
        <Link href="/sign-in" className="rounded bg-ink px-4 py-2 font-medium text-white">
          Sign in
        </Link>
        <Link href="/sign-up" className="rounded border border-ink px-4 py-2 font-medium">
          Create an account
        </Link>
      </div>
    </main>
  );
}
