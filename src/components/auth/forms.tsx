"use client";
import { getFormProps, useForm, type FieldMetadata, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import Link from "next/link";
import { useActionState } from "react";
import type { z } from "zod";
import { submitKeepingInput } from "@/components/forms/submit";
import { Field, FormMessage, primaryButton } from "@/components/forms/field";
import {
  ForgotPasswordSchema,
  PASSWORD_MIN,
  ResendVerificationSchema,
  ResetPasswordSchema,
  SignInSchema,
  SignUpSchema,
} from "@/schemas/auth";

export type FormAction = (prev: unknown, formData: FormData) => Promise<SubmissionResult<string[]> | undefined>;

/** conform + zod form state shared by every auth form: validate on blur, re-validate on input, server reply kept. */
function useZodForm<S extends z.ZodType>(
  schema: S,
  action: FormAction,
  id: string,
  defaultValue?: Record<string, string>,
) {
  const [lastResult, formAction, pending] = useActionState(action, undefined);
  const [form, fields] = useForm({
    id,
    lastResult,
    defaultValue,
    constraint: getZodConstraint(schema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onSubmit: submitKeepingInput(formAction),
  });
  // Every auth form field is a single string; one cast instead of one per form.
  return {
    form,
    fields: fields as unknown as { [K in keyof z.input<S>]-?: FieldMetadata<string | undefined> },
    formAction,
    pending,
  };
}

export function SignUpForm({ action, next, email }: { action: FormAction; next?: string; email?: string }) {
  const { form, fields, formAction, pending } = useZodForm(
    SignUpSchema,
    action,
    "sign-up",
    email ? { email } : undefined,
  );
  return (
    <form {...getFormProps(form)} action={formAction} noValidate className="flex flex-col gap-2">
      <FormMessage id={form.errorId} errors={form.errors} />
      {next ? <input type="hidden" name="next" value={next} /> : null}
      <Field meta={fields.name} label="Name" autoComplete="name" autoFocus />
      <Field meta={fields.email} label="E-mail address" type="email" autoComplete="email" />
      <Field
        meta={fields.password}
        label="Password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters.`}
      />
      <button type="submit" className={primaryButton} disabled={pending}>
        {pending ? "Creating account…" : "Create account"}
      </button>
    </form>
  );
}

export function SignInForm({ action, next, email }: { action: FormAction; next?: string; email?: string }) {
  const { form, fields, formAction, pending } = useZodForm(
    SignInSchema,
    action,
    "sign-in",
    email ? { email } : undefined,
  );
  return (
    <form {...getFormProps(form)} action={formAction} noValidate className="flex flex-col gap-2">
      <FormMessage id={form.errorId} errors={form.errors} />
      {next ? <input type="hidden" name="next" value={next} /> : null}
      <Field meta={fields.email} label="E-mail address" type="email" autoComplete="email" autoFocus />
      <Field meta={fields.password} label="Password" type="password" autoComplete="current-password" />
      <div className="-mt-1 mb-2 text-right text-sm">
        <Link href="/forgot-password" className="text-ink-soft underline">
          Forgot your password?
        </Link>
      </div>
      <button type="submit" className={primaryButton} disabled={pending}>
        {pending ? "Signing in…" : "Sign in"}
      </button>
    </form>
  );
}

export function ForgotPasswordForm({ action }: { action: FormAction }) {
  const { form, fields, formAction, pending } = useZodForm(ForgotPasswordSchema, action, "forgot-password");
  return (
    <form {...getFormProps(form)} action={formAction} noValidate className="flex flex-col gap-2">
      <FormMessage id={form.errorId} errors={form.errors} />
      <Field meta={fields.email} label="E-mail address" type="email" autoComplete="email" autoFocus />
      <button type="submit" className={primaryButton} disabled={pending}>
        {pending ? "Sending…" : "Send a reset link"}
      </button>
    </form>
  );
}

export function ResetPasswordForm({ action, token }: { action: FormAction; token: string }) {
  const { form, fields, formAction, pending } = useZodForm(ResetPasswordSchema, action, "reset-password");
  return (
    <form {...getFormProps(form)} action={formAction} noValidate className="flex flex-col gap-2">
      <FormMessage id={form.errorId} errors={form.errors} />
      <input type="hidden" name="token" value={token} />
      <Field
        meta={fields.password}
        label="New password"
        type="password"
        autoComplete="new-password"
        hint={`At least ${PASSWORD_MIN} characters.`}
        autoFocus
      />
      <Field meta={fields.confirm} label="Repeat the new password" type="password" autoComplete="new-password" />
      <button type="submit" className={primaryButton} disabled={pending}>
        {pending ? "Saving…" : "Save the new password"}
      </button>
    </form>
  );
}

export function ResendVerificationForm({ action, email }: { action: FormAction; email?: string }) {
  const { form, fields, formAction, pending } = useZodForm(
    ResendVerificationSchema,
    action,
    "resend-verification",
    email ? { email } : undefined,
  );
  return (
    <form {...getFormProps(form)} action={formAction} noValidate className="flex flex-col gap-2">
      <FormMessage id={form.errorId} errors={form.errors} />
      <Field meta={fields.email} label="E-mail address" type="email" autoComplete="email" />
      <button type="submit" className={primaryButton} disabled={pending}>
        {pending ? "Sending…" : "Send a new confirmation link"}
      </button>
    </form>
  );
}
