"use client";

import { getInputProps, getSelectProps, getTextareaProps, useField } from "@conform-to/react";
import { FieldHelper } from "../field-helper";
import { buttonClass, LaserSafetyNote } from "../ui";
import type { FieldSpec } from "./field-spec";

// One field of an entity form, as its spec says: the control for its kind
// (number, text, textarea, select, checkbox, a list of intervals), its label
// with the unit, help text, laser caution, errors and helper calculation.

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

/** One field of a conform form, with everything shown around its control. */
export function Field({ spec, disabled }: { spec: FieldSpec; disabled: boolean }) {
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
