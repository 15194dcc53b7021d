import type { Metadata } from "next";
import Link from "next/link";
import { ResetPasswordForm } from "@/components/auth/forms";
import { resetPasswordAction } from "../actions";

export const metadata: Metadata = { title: "Choose a new password" };

/** better-auth's reset link redirects here with `?token=` (or `?error=INVALID_TOKEN` when expired or used). */
export default async function ResetPasswordPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | undefined>>;
}) {
  const { token, error } = await searchParams;
  if (error || !token) {
    return (
      <>
        <h1 className="mb-3 text-2xl font-semibold tracking-tight">This reset link is not valid</h1>
        <p className="mb-6 text-sm leading-relaxed">
          Reset links are valid for one hour and work once. Ask for a new one; it replaces the old one.
        </p>
        <Link href="/forgot-password" className="inline-block rounded bg-ink px-4 py-2 text-sm font-medium text-white">
          Ask for a new link
        </Link>
      </>
    );
  }
  return (
    <>
      <h1 className="mb-5 text-2xl font-semibold tracking-tight">Choose a new password</h1>
      <ResetPasswordForm action={resetPasswordAction} token={token} />
    </>
  );
}
