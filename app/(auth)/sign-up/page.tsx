import type { Metadata } from "next";
import Link from "next/link";
import { SignUpForm } from "@/components/auth/forms";
import { safeNext } from "@/server/auth/errors";
import { signUpAction } from "../actions";

export const metadata: Metadata = { title: "Create an account" };

export default async function SignUpPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const { email } = await searchParams;
  // Only a path of this site is carried on (anything else is dropped: no open redirect).
  const next = safeNext((await searchParams).next, "") || undefined;
  return (
    <>
      <h1 className="mb-1 text-2xl font-semibold tracking-tight">Create an account</h1>
      <p className="mb-5 text-sm text-ink-soft">
        We send a link to confirm your e-mail address before you can sign in.
      </p>
      <SignUpForm action={signUpAction} next={next} email={email} />
      <p className="mt-5 text-sm">
        Already have an account?{" "}
        <Link href={next ? `/sign-in?next=${encodeURIComponent(next)}` : "/sign-in"} className="underline">
          Sign in
        </Link>
      </p>
    </>
  );
}
