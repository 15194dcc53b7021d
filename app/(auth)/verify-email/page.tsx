import type { Metadata } from "next";
import { ResendVerificationForm } from "@/components/auth/forms";
import { resendVerificationAction } from "../actions";

export const metadata: Metadata = { title: "Confirm your e-mail address" };

export default async function VerifyNoticePage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const { email, resent } = await searchParams;
  return (
    <>
      <h1 className="mb-3 text-2xl font-semibold tracking-tight">Check your inbox</h1>
      <p className="mb-2 text-sm leading-relaxed">
        {resent ? "We sent a new confirmation link" : "We sent a confirmation link"}
        {email ? (
          <>
            {" "}
            to <strong>{email}</strong>
          </>
        ) : null}
        . Open it to confirm your address; you are signed in right after.
      </p>
      <p className="mb-6 text-sm text-ink-soft">
        The link is valid for one hour. Nothing arrived? Check the spam folder, or ask for a new link:
      </p>
      <ResendVerificationForm action={resendVerificationAction} email={email} />
    </>
  );
}
