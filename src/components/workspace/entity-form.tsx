"use client";

import {
  FormProvider,
  getFormProps,
  getInputProps,
  getSelectProps,
  getTextareaProps,
  useField,
  useForm,
  type Submission,
  type SubmissionResult,
} from "@conform-to/react";
import { getZodConstraint, parseWithZod } from "@conform-to/zod/v4";
import { useMemo, useRef, useState } from "react";
import type { z } from "zod";
import { ApiError } from "@/queries/api";
import { FieldHelper, type HelperKind } from "./field-helper";
import { splitIssues } from "./form-errors";
import { buttonClass, LaserSafetyNote } from "./ui";

export type FieldSpec = {
  name: string;
  label: string;
  /** Shown in the label: "(GHz)". Every field names its unit, or what it counts. */
  unit: string;
  help?: string;
  /** Laser-safety caution beside optical power fields. */
  caution?: "laser";
  wide?: boolean;
  /** A helper calculation opened beside the field; its Apply fills the form. */
  helper?: HelperKind;
} & (
  | { kind: "number"; step?: string; placeholder?: string }
  | { kind: "text"; placeholder?: string }
  | { kind: "textarea" }
  | { kind: "select"; options: { value: string; label: string }[] }
  | { kind: "checkbox" }
  | { kind: "intervals"; newInterval: { minGHz: number; maxGHz: number } }
);

export interface FieldGroup {
  legend: string;
  fields: FieldSpec[];
}

/** Every leaf name of the specs, as conform names them (used to place server issues). */
export function fieldNames(groups: readonly FieldGroup[]): string[] {
  return groups.flatMap((g) => g.fields.map((f) => f.name));
}

function labelText(f: FieldSpec) {
  return (
    <>
      {f.label} <span className="font-normal text-ink-soft">({f.unit})</span>
    </>
  );
}

function ErrorLine({ id, errors }: { id: string; errors: string[] | undefined }) {
  return (
    <p id={id} className="min-h-[1.1rem] text-xs text-sev-error" aria-live="polite">
      {errors?.join("; ")}
    </p>
  );
}

function IntervalsField({ spec }: { spec: Extract<FieldSpec, { kind: "intervals" }> }) {
  const [meta, form] = useField<{ minGHz: number; maxGHz: number }[]>(spec.name);
  const list = meta.getFieldList();
  return (
    <fieldset className="col-span-2" aria-describedby={`${meta.id}-help ${meta.errorId}`}>
      <legend className="text-sm font-medium">{labelText(spec)}</legend>
      {spec.help ? (
        <p id={`${meta.id}-help`} className="text-xs text-ink-soft">
          {spec.help}
        </p>
      ) : null}
      <div className="mt-1 space-y-1">
        {list.map((item, index) => {
          const f = item.getFieldset();
          return (
            <div key={item.key} className="flex flex-wrap items-start gap-2">
              {(["minGHz", "maxGHz"] as const).map((k) => (
                <label key={k} className="flex flex-col text-xs">
                  <span>{k === "minGHz" ? "From" : "To"} (GHz)</span>
                  <input
                    {...getInputProps(f[k], { type: "number" })}
                    step="any"
                    className="w-32 rounded border border-ink/30 px-2 py-1 text-sm tabular-nums aria-[invalid=true]:border-sev-error"
                  />
                  <ErrorLine id={f[k].errorId} errors={f[k].errors} />
                </label>
              ))}
              {list.length > 1 ? (
                <button
                  {...form.remove.getButtonProps({ name: meta.name, index })}
                  className={`${buttonClass.quiet} mt-4`}
                  aria-label={`Remove interval ${index + 1}`}
                >
                  Remove
                </button>
              ) : null}
            </div>
          );
        })}
      </div>
      <button
        {...form.insert.getButtonProps({ name: meta.name, defaultValue: spec.newInterval })}
        className={buttonClass.quiet}
      >
        + Add interval
      </button>
      <ErrorLine id={meta.errorId} errors={meta.errors} />
    </fieldset>
  );
}

function Field({ spec, disabled }: { spec: FieldSpec; disabled: boolean }) {
  const [meta] = useField<unknown>(spec.name);
  if (spec.kind === "intervals") return <IntervalsField spec={spec} />;
  const helpId = `${meta.id}-help`;
  const describedBy = [spec.help ? helpId : null, meta.errorId].filter(Boolean).join(" ");
  const inputClass =
    "w-full rounded border border-ink/30 bg-white px-2 py-1.5 text-sm tabular-nums aria-[invalid=true]:border-sev-error focus:border-ink focus:outline-none focus:ring-1 focus:ring-ink";
  let control: React.ReactNode;
  if (spec.kind === "select") {
    control = (
      <select {...getSelectProps(meta)} aria-describedby={describedBy} disabled={disabled} className={inputClass}>
        <option value="">Choose…</option>
        {spec.options.map((o) => (
          <option key={o.value} value={o.value}>
            {o.label}
          </option>
        ))}
      </select>
    );
  } else if (spec.kind === "checkbox") {
    control = (
      <input
        {...getInputProps(meta, { type: "checkbox" })}
        aria-describedby={describedBy}
        disabled={disabled}
        className="h-4 w-4"
      />
    );
  } else if (spec.kind === "textarea") {
    control = (
      <textarea
        {...getTextareaProps(meta)}
        aria-describedby={describedBy}
        disabled={disabled}
        rows={3}
        className={inputClass}
      />
    );
  } else {
    control = (
      <input
        {...getInputProps(meta, { type: spec.kind === "number" ? "number" : "text" })}
        {...(spec.kind === "number" ? { step: spec.step ?? "any", inputMode: "decimal" as const } : {})}
        placeholder={spec.placeholder}
        aria-describedby={describedBy}
        disabled={disabled}
        className={inputClass}
      />
    );
  }
  return (
    <div className={spec.wide || spec.helper ? "col-span-2" : ""}>
      <label
        htmlFor={meta.id}
        className={`text-sm font-medium ${spec.kind === "checkbox" ? "flex items-center gap-2" : "block"}`}
      >
        {spec.kind === "checkbox" ? control : null}
        <span>{labelText(spec)}</span>
      </label>
      {spec.kind !== "checkbox" ? <div className="mt-0.5">{control}</div> : null}
      {spec.help ? (
        <p id={helpId} className="mt-0.5 text-xs leading-snug text-ink-soft">
          {spec.help}
        </p>
      ) : null}
      {spec.caution === "laser" ? <LaserSafetyNote className="mt-1" /> : null}
      <ErrorLine id={meta.errorId} errors={meta.errors} />
      {spec.helper && !disabled ? <FieldHelper kind={spec.helper} fieldName={spec.name} /> : null}
    </div>
  );
}

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

/**
 * Only the form's own fields (and conform's intent): a helper opened beside a
 * field has inputs of its own inside this form, which the strict schemas
 * would refuse as unknown keys.
 */
export function ownFields(formData: FormData, names: readonly string[]): FormData {
  const roots = new Set(names.map((n) => n.split(/[.[]/)[0]));
  const out = new FormData();
  for (const [k, v] of formData.entries()) {
    if (k.startsWith("__") || roots.has(k.split(/[.[]/)[0])) out.append(k, v);
  }
  return out;
}

function statusText(err: ApiError): string {
  if (err.status === 400) return err.message || "Some values were refused; see the fields below.";
  if (err.status === 403) return "Your role in this team does not allow this change.";
  if (err.status === 404) return "This item no longer exists (it may have been deleted). Reload the page.";
  return err.message;
}
