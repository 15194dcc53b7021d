import type { Metadata } from "next";
import Link from "next/link";
import { ForgotPasswordForm } from "@/components/auth/forms";
import { forgotPasswordAction } from "../actions";

export const metadata: Metadata = { title: "Forgot password" };

export default async function ForgotPasswordPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const { sent } = await searchParams;
  if (sent) {
    return (
      <>
        <h1 className="mb-3 text-2xl font-semibold tracking-tight">Check your inbox</h1>
        <p className="mb-6 text-sm leading-relaxed">
          If an account exists for <strong>{sent}</strong>, we sent it a link to choose a new password. The link is
          valid for one hour and works once.
        </p>
        <Link href="/sign-in" className="text-sm underline">
          Back to sign in
        </Link>
      </>
    );
  }
  return (
    <>
      <h1 className="mb-1 text-2xl font-semibold tracking-tight">Forgot your password?</h1>
      <p className="mb-5 text-sm text-ink-soft">
        Enter your e-mail address and we send you a link to choose a new one.
      </p>
      <ForgotPasswordForm action={forgotPasswordAction} />
      <p className="mt-5 text-sm">
        <Link href="/sign-in" className="underline">
          Back to sign in
        </Link>
      </p>
    </>
  );
}
