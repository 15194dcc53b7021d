"use server";
import { headers } from "next/headers";
import { redirect } from "next/navigation";
import { auth } from "@/server/auth/auth";
import { authError, isNextControlFlow, safeNext } from "@/server/auth/errors";
import { consumeAccountSignIn, consumeFormAttempt, type LimitedForm } from "@/server/auth/form-rate-limit";
import { listTeamsOf } from "@/server/auth/queries";
import {
  ForgotPasswordSchema,
  ResendVerificationSchema,
  ResetPasswordSchema,
  SignInSchema,
  SignUpSchema,
} from "@/schemas/auth";
import { formAction } from "@/server/core";

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

/**
 * Sign-up gives the same answer whether or not the address has an account
 * ("check your inbox"), so the form cannot be used to find out who has one;
 * the owner of a registered address gets a mail saying someone tried
 * (better-auth's onExistingUserSignUp, src/server/auth/auth.ts), exactly as
 * through the HTTP API.
 */
export const signUpAction = formAction(
  { access: "public", schema: SignUpSchema },
  async ({ value, formData, reply }) => {
    const tooMany = await limited("sign-up");
    if (tooMany) return reply({ formErrors: tooMany });
    const { name, email, password } = value;
    const next = formData.get("next");
    try {
      await auth.api.signUpEmail({
        body: { name, email, password, callbackURL: verifyCallback(typeof next === "string" ? next : undefined) },
        headers: await headers(),
      });
    } catch (err) {
      const e = authError(err);
      if (e?.status === 429) return reply({ formErrors: [TOO_MANY] });
      if (e?.code === "INVALID_EMAIL") return reply({ fieldErrors: { email: ["E-mail address is not valid."] } });
      if (e?.code === "PASSWORD_TOO_SHORT" || e?.code === "PASSWORD_TOO_LONG")
        return reply({ fieldErrors: { password: [e.message] } });
      if (e) return reply({ formErrors: [e.message] });
      throw err;
    }
    redirect(`/verify-email?email=${encodeURIComponent(email)}`);
  },
);

export const signInAction = formAction({ access: "public", schema: SignInSchema }, async ({ value, reply }) => {
  const tooMany = await limited("sign-in");
  if (tooMany) return reply({ formErrors: tooMany });
  const { email, password, next } = value;
  const accountWait = await consumeAccountSignIn(email);
  if (accountWait > 0)
    return reply({ formErrors: [`Too many sign-in attempts for this account. Try again in ${accountWait} s.`] });
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
      return reply({
        formErrors: [
          "Confirm your e-mail address first. We have sent a new confirmation link to " +
            email +
            "; open it and you are signed in.",
        ],
      });
    if (e?.code === "INVALID_EMAIL_OR_PASSWORD") return reply({ formErrors: ["E-mail address or password is wrong."] });
    if (e?.status === 429) return reply({ formErrors: [TOO_MANY] });
    if (e) return reply({ formErrors: [e.message] });
    throw err;
  }
  // The new session starts in the person's first team (see the session hook in src/server/auth/auth.ts).
  const teams = await listTeamsOf(userId);
  redirect(safeNext(next, teams.length ? "/missions" : "/teams/new"));
});

export const forgotPasswordAction = formAction(
  { access: "public", schema: ForgotPasswordSchema },
  async ({ value, reply }) => {
    const tooMany = await limited("forgot-password");
    if (tooMany) return reply({ formErrors: tooMany });
    try {
      await auth.api.requestPasswordReset({
        body: { email: value.email, redirectTo: "/reset-password" },
        headers: await headers(),
      });
    } catch (err) {
      const e = authError(err);
      if (e?.status === 429) return reply({ formErrors: [TOO_MANY] });
      if (e) return reply({ formErrors: [e.message] });
      throw err;
    }
    redirect(`/forgot-password?sent=${encodeURIComponent(value.email)}`);
  },
);

export const resetPasswordAction = formAction(
  { access: "public", schema: ResetPasswordSchema },
  async ({ value, reply }) => {
    const tooMany = await limited("reset-password");
    if (tooMany) return reply({ formErrors: tooMany });
    try {
      await auth.api.resetPassword({
        body: { token: value.token, newPassword: value.password },
        headers: await headers(),
      });
    } catch (err) {
      const e = authError(err);
      if (e?.code === "INVALID_TOKEN")
        return reply({
          formErrors: [
            "This reset link has expired or was already used. Ask for a new one on the “Forgot password” page.",
          ],
        });
      if (e?.code === "PASSWORD_TOO_SHORT" || e?.code === "PASSWORD_TOO_LONG")
        return reply({ fieldErrors: { password: [e.message] } });
      if (e?.status === 429) return reply({ formErrors: [TOO_MANY] });
      if (e) return reply({ formErrors: [e.message] });
      throw err;
    }
    redirect("/sign-in?reset=1");
  },
);

export const resendVerificationAction = formAction(
  { access: "public", schema: ResendVerificationSchema },
  async ({ value, reply }) => {
    const tooMany = await limited("resend-verification");
    if (tooMany) return reply({ formErrors: tooMany });
    try {
      await auth.api.sendVerificationEmail({
        body: { email: value.email, callbackURL: "/verify-email/result" },
        headers: await headers(),
      });
    } catch (err) {
      const e = authError(err);
      if (e?.status === 429) return reply({ formErrors: [TOO_MANY] });
      if (e?.code === "EMAIL_ALREADY_VERIFIED") redirect("/sign-in");
      if (e) return reply({ formErrors: [e.message] });
      throw err;
    }
    redirect(`/verify-email?email=${encodeURIComponent(value.email)}&resent=1`);
  },
);
