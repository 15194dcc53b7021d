"use client";
import { getFormProps, getSelectProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { useActionState } from "react";
import { submitKeepingInput } from "@/components/forms/submit";
import { Field, FieldFrame, FormMessage, submitButton } from "@/components/forms/field";
import type { FormAction } from "@/components/auth/forms";
import { InviteSchema } from "@/schemas/auth";

export type SmallAction = (
  prev: { error?: string; ok?: string } | undefined,
  formData: FormData,
) => Promise<{ error?: string; ok?: string } | undefined>;

const ROLE_LABEL: Record<string, string> = { owner: "Owner", lead: "Lead", engineer: "Engineer", viewer: "Viewer" };

export function InviteForm({ action, roles }: { action: FormAction; roles: readonly string[] }) {
  const [lastResult, formAction, pending] = useActionState(action, undefined);
  const [form, fields] = useForm({
    id: "invite",
    lastResult,
    defaultValue: { role: "engineer" },
    constraint: getZodConstraint(InviteSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: InviteSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onSubmit: submitKeepingInput(formAction),
  });
  const roleProps = getSelectProps(fields.role);
  return (
    <form {...getFormProps(form)} action={formAction} noValidate className="flex flex-col gap-2">
      <FormMessage id={form.errorId} errors={form.errors} />
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-[1fr_10rem_auto] sm:items-start">
        <Field meta={fields.email} label="E-mail address" type="email" autoComplete="off" />
        <FieldFrame meta={fields.role} label="Role">
          <select {...roleProps} key={roleProps.key} className="rounded border border-ink/30 px-2 py-2 text-sm">
            {roles.map((r) => (
              <option key={r} value={r}>
                {ROLE_LABEL[r] ?? r}
              </option>
            ))}
          </select>
        </FieldFrame>
        <button type="submit" disabled={pending} className={`mt-6 ${submitButton}`}>
          {pending ? "Sending…" : "Send invitation"}
        </button>
      </div>
    </form>
  );
}

export function RoleSelectForm({
  action,
  memberId,
  role,
  label,
}: {
  action: SmallAction;
  memberId: string;
  role: string;
  label: string;
}) {
  const [state, formAction, pending] = useActionState(action, undefined);
  const id = `role-${memberId}`;
  return (
    <form action={formAction} className="flex flex-wrap items-center gap-2">
      <input type="hidden" name="memberId" value={memberId} />
      <label htmlFor={id} className="sr-only">
        Role of {label}
      </label>
      <select id={id} name="role" defaultValue={role} className="rounded border border-ink/30 px-2 py-1 text-sm">
        {Object.entries(ROLE_LABEL).map(([value, text]) => (
          <option key={value} value={value}>
            {text}
          </option>
        ))}
      </select>
      <button
        type="submit"
        disabled={pending}
        className="rounded border border-ink/30 px-2 py-1 text-xs hover:bg-ink-faint"
      >
        Save role
      </button>
      <Status state={state} />
    </form>
  );
}

export function ActionButton({
  action,
  fields,
  label,
  confirmText,
  danger = false,
  large = false,
}: {
  action: SmallAction;
  fields: Record<string, string>;
  label: string;
  confirmText?: string;
  danger?: boolean;
  large?: boolean;
}) {
  const [state, formAction, pending] = useActionState(action, undefined);
  return (
    <form
      action={formAction}
      onSubmit={(e) => {
        if (confirmText && !window.confirm(confirmText)) e.preventDefault();
      }}
      className="flex flex-wrap items-center gap-2"
    >
      {Object.entries(fields).map(([k, v]) => (
        <input key={k} type="hidden" name={k} value={v} />
      ))}
      <button
        type="submit"
        disabled={pending}
        className={`rounded border ${large ? "px-4 py-2 text-sm font-medium" : "px-2 py-1 text-xs"} ${
          danger
            ? "border-sev-error/40 text-sev-error hover:bg-red-50"
            : large
              ? "border-ink bg-ink text-white hover:bg-ink-soft"
              : "border-ink/30 hover:bg-ink-faint"
        }`}
      >
        {label}
      </button>
      <Status state={state} />
    </form>
  );
}

function Status({ state }: { state: { error?: string; ok?: string } | undefined }) {
  if (state?.error)
    return (
      <span role="alert" className="text-xs text-sev-error">
        {state.error}
      </span>
    );
  if (state?.ok)
    return (
      <span role="status" className="text-xs text-sev-ok">
        {state.ok}
      </span>
    );
  return null;
}
