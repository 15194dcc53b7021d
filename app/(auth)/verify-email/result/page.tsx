import type { Metadata } from "next";
import { headers } from "next/headers";
import Link from "next/link";
import { ResendVerificationForm } from "@/components/auth/forms";
import { auth } from "@/server/auth/auth";
import { safeNext } from "@/server/auth/errors";
import { resendVerificationAction } from "../../actions";

export const metadata: Metadata = { title: "E-mail confirmation" };

/**
 * Where the confirmation link lands (better-auth redirects here, with
 * `?error=` when the token is expired or invalid). A reused link lands here
 * with no error and no new session.
 */
export default async function VerifyResultPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const { error } = await searchParams;
  const next = safeNext((await searchParams).next, "") || undefined;
  const session = await auth.api.getSession({ headers: await headers() });
  const link = "inline-block rounded bg-ink px-4 py-2 text-sm font-medium text-white";

  if (error) {
    const expired = error === "TOKEN_EXPIRED";
    return (
      <>
        <h1 className="mb-3 text-2xl font-semibold tracking-tight" data-verify-result="invalid">
          {expired ? "This confirmation link has expired" : "This confirmation link is not valid"}
        </h1>
        <p className="mb-6 text-sm leading-relaxed">
          {expired
            ? "Confirmation links are valid for one hour."
            : "The link may be incomplete (copied only in part) or belong to another address."}{" "}
          Ask for a new link below; it replaces the old one.
        </p>
        <ResendVerificationForm action={resendVerificationAction} />
      </>
    );
  }

  if (session?.user.emailVerified) {
    return (
      <>
        <h1 className="mb-3 text-2xl font-semibold tracking-tight" data-verify-result="confirmed">
          Your e-mail address is confirmed
        </h1>
        <p className="mb-6 text-sm">Welcome, {session.user.name}. You are signed in.</p>
        <Link href={safeNext(next, "/missions")} className={link}>
          Continue
        </Link>
      </>
    );
  }

  return (
    <>
      <h1 className="mb-3 text-2xl font-semibold tracking-tight" data-verify-result="used">
        This confirmation link was already used
      </h1>
      <p className="mb-6 text-sm leading-relaxed">
        Each link works once. If you opened it before, your address is already confirmed: sign in to continue. If you
        cannot sign in, ask for a new link from the sign-in page.
      </p>
      <Link href={next ? `/sign-in?next=${encodeURIComponent(next)}` : "/sign-in"} className={link}>
        Sign in
      </Link>
    </>
  );
}
