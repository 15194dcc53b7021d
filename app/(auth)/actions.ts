"use server";
import { parseWithZod } from "@conform-to/zod/v4";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { auth } from "@/server/auth/auth";
import { authError, isNextControlFlow, safeNext } from "@/server/auth/errors";
import { consumeFormAttempt, type LimitedForm } from "@/server/auth/form-rate-limit";
import { emailIsRegistered, listTeamsOf } from "@/server/auth/queries";
import {
  ForgotPasswordSchema,
  ResendVerificationSchema,
  ResetPasswordSchema,
  SignInSchema,
  SignUpSchema,
} from "@/schemas/auth";

const TOO_MANY = "Too many attempts from this address. Wait a minute and try again.";

/** A form-level refusal when this client has made too many attempts (see form-rate-limit.ts). */
async function limited(form: LimitedForm): Promise<string[] | null> {
  const wait = await consumeFormAttempt(form, await headers());
  return wait > 0 ? [`Too many attempts from this address. Try again in ${wait} s.`] : null;
}

function verifyCallback(next: string | undefined): string {
  const n = safeNext(next, "");
  return n ? `/verify-email/result?next=${encodeURIComponent(n)}` : "/verify-email/result";
}

export async function signUpAction(_prev: unknown, formData: FormData) {
  const submission = parseWithZod(formData, { schema: SignUpSchema });
  if (submission.status !== "success") return submission.reply();
  const tooMany = await limited("sign-up");
  if (tooMany) return submission.reply({ formErrors: tooMany });
  const { name, email, password } = submission.value;
  const next = formData.get("next");
  if (await emailIsRegistered(email)) {
    return submission.reply({
      fieldErrors: {
        email: ["An account with this e-mail address already exists. Sign in, or reset the password if you forgot it."],
      },
    });
  }
  try {
    await auth.api.signUpEmail({
      body: { name, email, password, callbackURL: verifyCallback(typeof next === "string" ? next : undefined) },
      headers: await headers(),
    });
  } catch (err) {
    const e = authError(err);
    if (e?.status === 429) return submission.reply({ formErrors: [TOO_MANY] });
    if (e?.code === "INVALID_EMAIL")
      return submission.reply({ fieldErrors: { email: ["E-mail address is not valid."] } });
    if (e?.code === "PASSWORD_TOO_SHORT" || e?.code === "PASSWORD_TOO_LONG")
      return submission.reply({ fieldErrors: { password: [e.message] } });
    if (e) return submission.reply({ formErrors: [e.message] });
    throw err;
  }
  redirect(`/verify-email?email=${encodeURIComponent(email)}`);
}

export async function signInAction(_prev: unknown, formData: FormData) {
  const submission = parseWithZod(formData, { schema: SignInSchema });
  if (submission.status !== "success") return submission.reply();
  const tooMany = await limited("sign-in");
  if (tooMany) return submission.reply({ formErrors: tooMany });
  const { email, password, next } = submission.value;
  let userId: string;
  try {
    const res = await auth.api.signInEmail({
      body: { email, password, callbackURL: verifyCallback(next) },
      headers: await headers(),
    });
    userId = res.user.id;
  } catch (err) {
    if (isNextControlFlow(err)) throw err;
    const e = authError(err);
    if (e?.code === "EMAIL_NOT_VERIFIED")
      return submission.reply({
        formErrors: [
          "Confirm your e-mail address first. We have sent a new confirmation link to " +
            email +
            "; open it and you are signed in.",
        ],
      });
    if (e?.code === "INVALID_EMAIL_OR_PASSWORD")
      return submission.reply({ formErrors: ["E-mail address or password is wrong."] });
    if (e?.status === 429) return submission.reply({ formErrors: [TOO_MANY] });
    if (e) return submission.reply({ formErrors: [e.message] });
    throw err;
  }
  // The new session starts in the person's first team (see the session hook in src/server/auth/auth.ts).
  const teams = await listTeamsOf(userId);
  redirect(safeNext(next, teams.length ? "/missions" : "/teams/new"));
}

export async function forgotPasswordAction(_prev: unknown, formData: FormData) {
  const submission = parseWithZod(formData, { schema: ForgotPasswordSchema });
  if (submission.status !== "success") return submission.reply();
  const tooMany = await limited("forgot-password");
  if (tooMany) return submission.reply({ formErrors: tooMany });
  try {
    await auth.api.requestPasswordReset({
      body: { email: submission.value.email, redirectTo: "/reset-password" },
      headers: await headers(),
    });
  } catch (err) {
    const e = authError(err);
    if (e?.status === 429) return submission.reply({ formErrors: [TOO_MANY] });
    if (e) return submission.reply({ formErrors: [e.message] });
    throw err;
  }
  redirect(`/forgot-password?sent=${encodeURIComponent(submission.value.email)}`);
}

export async function resetPasswordAction(_prev: unknown, formData: FormData) {
  const submission = parseWithZod(formData, { schema: ResetPasswordSchema });
  if (submission.status !== "success") return submission.reply();
  const tooMany = await limited("reset-password");
  if (tooMany) return submission.reply({ formErrors: tooMany });
  try {
    await auth.api.resetPassword({
      body: { token: submission.value.token, newPassword: submission.value.password },
      headers: await headers(),
    });
  } catch (err) {
    const e = authError(err);
    if (e?.code === "INVALID_TOKEN")
      return submission.reply({
        formErrors: [
          "This reset link has expired or was already used. Ask for a new one on the “Forgot password” page.",
        ],
      });
    if (e?.code === "PASSWORD_TOO_SHORT" || e?.code === "PASSWORD_TOO_LONG")
      return submission.reply({ fieldErrors: { password: [e.message] } });
    if (e?.status === 429) return submission.reply({ formErrors: [TOO_MANY] });
    if (e) return submission.reply({ formErrors: [e.message] });
    throw err;
  }
  redirect("/sign-in?reset=1");
}

export async function resendVerificationAction(_prev: unknown, formData: FormData) {
  const submission = parseWithZod(formData, { schema: ResendVerificationSchema });
  if (submission.status !== "success") return submission.reply();
  const tooMany = await limited("resend-verification");
  if (tooMany) return submission.reply({ formErrors: tooMany });
  try {
    await auth.api.sendVerificationEmail({
      body: { email: submission.value.email, callbackURL: "/verify-email/result" },
      headers: await headers(),
    });
  } catch (err) {
    const e = authError(err);
    if (e?.status === 429) return submission.reply({ formErrors: [TOO_MANY] });
    if (e?.code === "EMAIL_ALREADY_VERIFIED") redirect("/sign-in");
    if (e) return submission.reply({ formErrors: [e.message] });
    throw err;
  }
  redirect(`/verify-email?email=${encodeURIComponent(submission.value.email)}&resent=1`);
}
