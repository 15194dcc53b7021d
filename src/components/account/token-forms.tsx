"use client";
import { getFormProps, getInputProps, getSelectProps, useForm, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { useActionState, useState } from "react";
import { Field, FieldFrame, FormMessage, submitButton } from "@/components/forms/field";
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
          <FieldFrame label="Team" meta={fields.teamId}>
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
          </FieldFrame>
          <FieldFrame label="Role of the token" meta={fields.role} hint="Never higher than your own role in the team.">
            <select {...roleProps} key={`${roleProps.key}-${teamId}`} className={inputClass}>
              {grantable.map((r) => (
                <option key={r} value={r}>
                  {r}
                </option>
              ))}
            </select>
          </FieldFrame>
          <FieldFrame
            label="Days until it expires"
            meta={fields.expiresInDays}
            hint={`${TOKEN_LIMITS.expiresInDays.min} to ${TOKEN_LIMITS.expiresInDays.max}.`}
          >
            <input {...days} key={days.key} className={inputClass} />
          </FieldFrame>
          <FieldFrame
            label="Requests per minute"
            meta={fields.requestsPerMinute}
            hint={`At most ${TOKEN_LIMITS.requestsPerMinute.max}; more answer 429 until the minute is over.`}
          >
            <input {...rpm} key={rpm.key} className={inputClass} />
          </FieldFrame>
        </div>
        <div>
          <button type="submit" disabled={pending} className={submitButton}>
            {pending ? "Making…" : "Make token"}
          </button>
        </div>
      </form>
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
