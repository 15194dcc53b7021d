"use client";
import { getFormProps, getInputProps, getSelectProps, useForm, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { useActionState, useState } from "react";
import { Field, FormMessage } from "@/components/forms/field";
import { submitKeepingInput } from "@/components/forms/submit";
import { createTokenSchema, TOKEN_LIMITS } from "@/schemas/api-tokens";

/** What the create action answers: conform's reply, plus the secret once on success. */
export type CreateTokenResult = SubmissionResult<string[]> & { token?: string; tokenName?: string };
export type CreateTokenAction = (prev: unknown, formData: FormData) => Promise<CreateTokenResult | undefined>;

export interface TeamChoice {
  id: string;
  name: string;
  role: string;
  /** Roles a token of this person may have in this team (never above their own). */
  grantable: string[];
}

const inputClass = "rounded border border-ink/30 px-3 py-2 text-sm";

/**
 * The form that makes a token. On success the secret is shown once, with a
 * copy button; it is not stored anywhere the page can read it again.
 */
export function CreateTokenForm({ action, teams }: { action: CreateTokenAction; teams: TeamChoice[] }) {
  const [lastResult, formAction, pending] = useActionState(action, undefined);
  const [teamId, setTeamId] = useState(teams[0]?.id ?? "");
  const [form, fields] = useForm({
    id: "create-token",
    lastResult,
    defaultValue: {
      teamId: teams[0]?.id ?? "",
      role: teams[0]?.grantable.includes("engineer") ? "engineer" : (teams[0]?.grantable[0] ?? "viewer"),
      expiresInDays: String(TOKEN_LIMITS.expiresInDays.default),
      requestsPerMinute: String(TOKEN_LIMITS.requestsPerMinute.default),
    },
    constraint: getZodConstraint(createTokenSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: createTokenSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onSubmit: submitKeepingInput(formAction),
  });
  const grantable = teams.find((t) => t.id === teamId)?.grantable ?? [];
  const teamProps = getSelectProps(fields.teamId);
  const roleProps = getSelectProps(fields.role);
  const days = getInputProps(fields.expiresInDays, { type: "number" });
  const rpm = getInputProps(fields.requestsPerMinute, { type: "number" });
  return (
    <div className="flex flex-col gap-3">
      {lastResult?.token ? <NewToken token={lastResult.token} name={lastResult.tokenName ?? ""} /> : null}
      <form {...getFormProps(form)} action={formAction} noValidate className="flex flex-col gap-2">
        <FormMessage id={form.errorId} errors={form.errors} />
        <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
          <Field meta={fields.name} label="Name" hint="What the token is for, e.g. “CI baseline pull”." />
          <Select label="Team" errorId={fields.teamId.errorId} errors={fields.teamId.errors} id={fields.teamId.id}>
            <select
              {...teamProps}
              key={teamProps.key}
              onChange={(e) => setTeamId(e.target.value)}
              className={inputClass}
            >
              {teams.map((t) => (
                <option key={t.id} value={t.id}>
                  {t.name} (you are {t.role})
                </option>
              ))}
            </select>
          </Select>
          <Select
            label="Role of the token"
            errorId={fields.role.errorId}
            errors={fields.role.errors}
            id={fields.role.id}
            hint="Never higher than your own role in the team."
          >
            <select {...roleProps} key={`${roleProps.key}-${teamId}`} className={inputClass}>
              {grantable.map((r) => (
                <option key={r} value={r}>
                  {r}
                </option>
              ))}
            </select>
          </Select>
          <Select
            label="Days until it expires"
            errorId={fields.expiresInDays.errorId}
            errors={fields.expiresInDays.errors}
            id={fields.expiresInDays.id}
            hint={`${TOKEN_LIMITS.expiresInDays.min} to ${TOKEN_LIMITS.expiresInDays.max}.`}
          >
            <input {...days} key={days.key} className={inputClass} />
          </Select>
          <Select
            label="Requests per minute"
            errorId={fields.requestsPerMinute.errorId}
            errors={fields.requestsPerMinute.errors}
            id={fields.requestsPerMinute.id}
            hint={`At most ${TOKEN_LIMITS.requestsPerMinute.max}; more answer 429 until the minute is over.`}
          >
            <input {...rpm} key={rpm.key} className={inputClass} />
          </Select>
        </div>
        <div>
          <button
            type="submit"
            disabled={pending}
            className="rounded bg-ink px-4 py-2 text-sm font-medium text-white hover:bg-ink-soft disabled:opacity-60"
          >
            {pending ? "Making…" : "Make token"}
          </button>
        </div>
      </form>
    </div>
  );
}

function Select({
  label,
  id,
  errorId,
  errors,
  hint,
  children,
}: {
  label: string;
  id: string;
  errorId: string;
  errors?: string[];
  hint?: string;
  children: React.ReactNode;
}) {
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium">
        {label}
      </label>
      {children}
      {hint ? <p className="text-xs text-ink-soft">{hint}</p> : null}
      <p id={errorId} className="min-h-[1.25rem] text-sm text-sev-error" role={errors?.length ? "alert" : undefined}>
        {errors?.join(" ")}
      </p>
    </div>
  );
}

/** The secret of a token just made: shown this once. */
function NewToken({ token, name }: { token: string; name: string }) {
  const [copied, setCopied] = useState(false);
  return (
    <div role="status" className="rounded border border-sev-ok/40 bg-green-50 px-3 py-2 text-sm">
      <p className="mb-1 font-medium">
        Token “{name}” made. Copy it now: it is shown only this once and cannot be read again.
      </p>
      <div className="flex flex-wrap items-center gap-2">
        <code data-testid="new-token" className="break-all rounded bg-white px-2 py-1 font-mono text-xs">
          {token}
        </code>
        <button
          type="button"
          className="rounded border border-ink/30 px-2 py-1 text-xs hover:bg-ink-faint"
          onClick={() => {
            void navigator.clipboard?.writeText(token).then(() => setCopied(true));
          }}
        >
          {copied ? "Copied" : "Copy"}
        </button>
      </div>
    </div>
  );
}
