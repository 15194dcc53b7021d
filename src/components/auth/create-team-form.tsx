"use client";
import { getFormProps, useForm } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { useActionState } from "react";
import { submitKeepingInput } from "@/components/forms/submit";
import { Field, FormMessage, primaryButton } from "@/components/forms/field";
import { CreateTeamSchema } from "@/schemas/auth";
import type { FormAction } from "./forms";

export function CreateTeamForm({ action }: { action: FormAction }) {
  const [lastResult, formAction, pending] = useActionState(action, undefined);
  const [form, fields] = useForm({
    id: "create-team",
    lastResult,
    constraint: getZodConstraint(CreateTeamSchema),
    onValidate: ({ formData }) => parseWithZod(formData, { schema: CreateTeamSchema }),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onSubmit: submitKeepingInput(formAction),
  });
  return (
    <form {...getFormProps(form)} action={formAction} noValidate className="flex flex-col gap-2">
      <FormMessage id={form.errorId} errors={form.errors} />
      <Field
        meta={fields.name}
        label="Team name"
        hint="For example the instrument or the group building it."
        autoFocus
      />
      <button type="submit" className={primaryButton} disabled={pending}>
        {pending ? "Creating…" : "Create team"}
      </button>
    </form>
  );
}
