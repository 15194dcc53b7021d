"use client";

import { FormProvider, getFormProps, useForm, type Submission, type SubmissionResult } from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { useMemo, useRef, useState } from "react";
import type { z } from "zod";
import { ApiError } from "@/queries/api";
import { Field } from "./entity-form/field";
import { fieldNames, type FieldGroup } from "./entity-form/field-spec";
import { ownFields } from "./entity-form/own-fields";
import { splitIssues, statusText } from "./form-errors";
import { buttonClass } from "./ui";

export { fieldNames, ownFields };
export type { FieldGroup, FieldSpec } from "./entity-form/field-spec";

export interface EntityFormProps<S extends z.ZodType> {
  formId: string;
  schema: S;
  groups: FieldGroup[];
  defaultValue: Record<string, unknown>;
  /** The version last read (updates), or null when creating. */
  version: number | null;
  submitLabel: string;
  /** Saves the parsed value; throws ApiError on failure. */
  save: (value: z.output<S>, version: number | null) => Promise<void>;
  onDone?: () => void;
  onCancel?: () => void;
  /** Turns a 409's `current` row into form values. */
  toFormValue?: (current: Record<string, unknown>) => Record<string, unknown>;
}

/**
 * One conform form for one entity: field errors beside the fields as you
 * type, server issues placed on their fields, the user's input kept after
 * any server error, and on a 409 (someone saved first) a choice between
 * loading the saved values and saving the user's input over them.
 */
export function EntityForm<S extends z.ZodType>(props: EntityFormProps<S>) {
  const [base, setBase] = useState({ values: props.defaultValue, version: props.version, generation: 0 });
  const [conflict, setConflict] = useState<{ current: Record<string, unknown> | null; message: string } | null>(null);
  return (
    <div>
      {conflict ? (
        <div role="alert" className="mb-3 rounded border border-sev-warning/50 bg-amber-50 px-3 py-2 text-sm">
          <p className="font-semibold text-sev-warning">Someone else saved this first.</p>
          <p className="mt-0.5">
            {conflict.message} Nothing was overwritten; your input is still in the form below.
            {conflict.current && typeof conflict.current.version === "number"
              ? ` The saved copy is now version ${conflict.current.version}.`
              : ""}
          </p>
          <div className="mt-2 flex flex-wrap gap-2">
            <button
              type="button"
              className={buttonClass.secondary}
              onClick={() => {
                const cur = conflict.current;
                if (cur)
                  setBase((b) => ({
                    values: props.toFormValue ? props.toFormValue(cur) : cur,
                    version: typeof cur.version === "number" ? cur.version : b.version,
                    generation: b.generation + 1,
                  }));
                setConflict(null);
              }}
            >
              Reload the saved values
            </button>
            {conflict.current && typeof conflict.current.version === "number" ? (
              <button
                type="button"
                className={buttonClass.quiet}
                onClick={() => {
                  const v = conflict.current?.version as number;
                  setBase((b) => ({ ...b, version: v }));
                  setConflict(null);
                }}
              >
                Keep my input (the next save replaces version {String(conflict.current.version)})
              </button>
            ) : null}
          </div>
        </div>
      ) : null}
      <InnerForm
        key={base.generation}
        {...props}
        defaultValue={base.values}
        version={base.version}
        onConflict={setConflict}
      />
    </div>
  );
}

function InnerForm<S extends z.ZodType>(
  props: EntityFormProps<S> & {
    onConflict: (c: { current: Record<string, unknown> | null; message: string }) => void;
  },
) {
  const { schema, groups } = props;
  const [lastResult, setLastResult] = useState<SubmissionResult<string[]> | undefined>(undefined);
  const [pending, setPending] = useState(false);
  const names = useMemo(() => fieldNames(groups), [groups]);
  const plainSchema = schema as unknown as z.ZodType<Record<string, unknown>>;
  const submissionRef = useRef<Submission<Record<string, unknown>> | null>(null);
  const [form] = useForm<Record<string, unknown>>({
    id: props.formId,
    lastResult,
    defaultValue: props.defaultValue as never,
    constraint: getZodConstraint(plainSchema),
    shouldValidate: "onBlur",
    shouldRevalidate: "onInput",
    onValidate({ formData }) {
      const submission = parseWithZod(ownFields(formData, names), { schema: plainSchema });
      submissionRef.current = submission;
      return submission;
    },
    async onSubmit(event, { submission }) {
      event.preventDefault();
      if (!submission || submission.status !== "success") return;
      const sub = submissionRef.current;
      setPending(true);
      try {
        await props.save(submission.value as z.output<S>, props.version);
        setLastResult(undefined);
        props.onDone?.();
      } catch (e) {
        const err = e instanceof ApiError ? e : new ApiError(0, "client", (e as Error).message);
        if (err.status === 409) {
          props.onConflict({
            current: (err.current as Record<string, unknown> | undefined) ?? null,
            message: err.message,
          });
          // Keep the input: reply with no errors so conform holds the submitted values.
          if (sub) setLastResult(sub.reply());
        } else if (sub) {
          const { fieldErrors, formErrors } = splitIssues(err.issues, names);
          setLastResult(sub.reply({ fieldErrors, formErrors: [statusText(err), ...formErrors] }));
        }
      } finally {
        setPending(false);
      }
    },
  });
  return (
    <FormProvider context={form.context}>
      <form {...getFormProps(form)} className="space-y-4" aria-busy={pending}>
        {form.errors && form.errors.length > 0 ? (
          <div
            id={form.errorId}
            role="alert"
            className="rounded border border-sev-error/40 bg-red-50 px-3 py-2 text-sm text-sev-error"
          >
            <p className="font-semibold">Not saved.</p>
            <ul className="mt-0.5 list-disc pl-5 text-ink">
              {form.errors.map((e) => (
                <li key={e}>{e}</li>
              ))}
            </ul>
          </div>
        ) : null}
        {groups.map((g) => (
          <fieldset key={g.legend} className="rounded border border-ink/10 p-3">
            <legend className="px-1 text-xs font-semibold uppercase tracking-wide text-ink-soft">{g.legend}</legend>
            <div className="grid grid-cols-2 gap-x-4 gap-y-1">
              {g.fields.map((f) => (
                <Field key={f.name} spec={f} disabled={pending} />
              ))}
            </div>
          </fieldset>
        ))}
        <div className="flex items-center gap-2">
          <button type="submit" className={buttonClass.primary} disabled={pending}>
            {pending ? "Saving and re-checking…" : props.submitLabel}
          </button>
          {props.onCancel ? (
            <button type="button" className={buttonClass.quiet} onClick={props.onCancel}>
              Cancel
            </button>
          ) : null}
          {props.version !== null ? (
            <span className="ml-auto text-xs text-ink-soft">editing version {props.version}</span>
          ) : null}
        </div>
      </form>
    </FormProvider>
  );
}
