"use client";
import { getFormProps, getInputProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { useActionState } from "react";
import type { z } from "zod";
import { notificationPreferencesSchema } from "@/schemas/review";
import { FormMessage } from "@/components/forms/field";
import { submitKeepingInput } from "@/components/forms/submit";

type Prefs = z.infer<typeof notificationPreferencesSchema>;
type Action = (prev: unknown, formData: FormData) => Promise<unknown>;

const OPTIONS: { name: keyof Prefs; label: string; hint: string }[] = [
  { name: "reviewRequested", label: "A plan is submitted for review", hint: "Sent to the team's leads and owners." },
  {
    name: "reviewDecided",
    label: "My submitted plan is baselined or sent back",
    hint: "Sent to whoever submitted or wrote the revision.",
  },
  { name: "mentioned", label: "Someone mentions me in a comment", hint: "@your name or @your e-mail address." },
];

/** The review e-mails a person wants (one conform form, re-parsed by the server action). */
export function NotificationForm({ initial, action }: { initial: Prefs; action: Action }) {
  const [lastResult, formAction, pending] = useActionState(action, undefined);
  const [form, fields] = useForm({
    lastResult: lastResult as never,
    defaultValue: initial,
    constraint: getZodConstraint(notificationPreferencesSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: notificationPreferencesSchema }),
    onSubmit: submitKeepingInput(formAction),
    shouldRevalidate: "onInput",
  });
  const saved = (lastResult as { saved?: boolean } | undefined)?.saved;
  return (
    <form {...getFormProps(form)} action={formAction} className="mt-4 flex flex-col gap-3">
      <FormMessage id={form.errorId} errors={form.errors} />
      {OPTIONS.map((o) => {
        const meta = fields[o.name];
        const props = getInputProps(meta, { type: "checkbox" });
        return (
          <div key={o.name} className="flex items-start gap-2">
            <input {...props} key={props.key} className="mt-1" aria-describedby={`${meta.id}-hint`} />
            <div>
              <label htmlFor={meta.id} className="text-sm font-medium">
                {o.label}
              </label>
              <p id={`${meta.id}-hint`} className="text-xs text-slate-600">
                {o.hint}
              </p>
            </div>
          </div>
        );
      })}
      <div className="flex items-center gap-3">
        <button
          type="submit"
          disabled={pending}
          className="rounded bg-slate-900 px-3 py-1.5 text-sm font-medium text-white disabled:opacity-50"
        >
          Save
        </button>
        {saved && !pending ? (
          <span role="status" className="text-sm text-emerald-800">
            Saved.
          </span>
        ) : null}
      </div>
    </form>
  );
}
