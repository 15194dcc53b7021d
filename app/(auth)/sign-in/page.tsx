import type { Metadata } from "next";
import Link from "next/link";
import { SignInForm } from "@/components/auth/forms";
import { safeNext } from "@/server/auth/errors";
import { signInAction } from "../actions";

export const metadata: Metadata = { title: "Sign in" };

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const { email, reset } = await searchParams;
  // Only a path of this site is carried on (anything else is dropped: no open redirect).
  const next = safeNext((await searchParams).next, "") || undefined;
  return (
    <>
      <h1 className="mb-5 text-2xl font-semibold tracking-tight">Sign in</h1>
      {reset ? (
        <p role="status" className="mb-4 rounded border border-sev-ok/40 bg-green-50 px-3 py-2 text-sm text-sev-ok">
          Your password was changed. Sign in with the new one.
        </p>
      ) : null}
      <SignInForm action={signInAction} next={next} email={email} />
      <p className="mt-5 text-sm">
        New to Heterolane?{" "}
        <Link href={next ? `/sign-up?next=${encodeURIComponent(next)}` : "/sign-up"} className="underline">
          Create an account
        </Link>
      </p>
    </>
  );
}
