"use client";
import type { FieldMetadata } from "@conform-to/react";
import { getInputProps } from "@conform-to/react";
import type { ReactNode } from "react";

/**
 * A labelled input with its error line: `id`, `aria-invalid` and
 * `aria-describedby` wired by conform, room reserved for the message so the
 * layout does not jump.
 */
export function Field({
  meta,
  label,
  type = "text",
  hint,
  autoComplete,
  autoFocus,
}: {
  meta: FieldMetadata<string | undefined>;
  label: string;
  type?: "text" | "email" | "password";
  hint?: string;
  autoComplete?: string;
  autoFocus?: boolean;
}) {
  const hintId = `${meta.id}-hint`;
  const props = getInputProps(meta, { type, ariaDescribedBy: hint ? hintId : undefined });
  const invalid = !!meta.errors?.length;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={meta.id} className="text-sm font-medium">
        {label}
      </label>
      <input
        {...props}
        key={props.key}
        // Passwords are never echoed back into the page after a failed submit.
        defaultValue={type === "password" ? undefined : props.defaultValue}
        autoComplete={autoComplete}
        autoFocus={autoFocus}
        className={`rounded border px-3 py-2 text-sm outline-none focus:ring-2 focus:ring-ink/30 ${
          invalid ? "border-sev-error" : "border-ink/30"
        }`}
      />
      {hint ? (
        <p id={hintId} className="text-xs text-ink-soft">
          {hint}
        </p>
      ) : null}
      <p id={meta.errorId} className="min-h-[1.25rem] text-sm text-sev-error" role={invalid ? "alert" : undefined}>
        {meta.errors?.join(" ")}
      </p>
    </div>
  );
}

/**
 * A labelled control of a form field (a select, or an input the caller
 * builds) with its hint and error line, wired to conform's field metadata.
 */
export function FieldFrame({
  meta,
  label,
  hint,
  children,
}: {
  meta: { id: string; errorId: string; errors?: string[] };
  label: string;
  hint?: string;
  children: ReactNode;
}) {
  const errors = meta.errors;
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={meta.id} className="text-sm font-medium">
        {label}
      </label>
      {children}
      {hint ? <p className="text-xs text-ink-soft">{hint}</p> : null}
      <p
        id={meta.errorId}
        className="min-h-[1.25rem] text-sm text-sev-error"
        role={errors?.length ? "alert" : undefined}
      >
        {errors?.join(" ")}
      </p>
    </div>
  );
}

export function FormMessage({ id, errors }: { id: string; errors?: string[] }) {
  if (!errors?.length) return null;
  return (
    <div id={id} role="alert" className="rounded border border-sev-error/40 bg-red-50 px-3 py-2 text-sm text-sev-error">
      {errors.join(" ")}
    </div>
  );
}

/** The primary submit button of a form, without its width. */
export const submitButton =
  "rounded bg-ink px-4 py-2 text-sm font-medium text-white hover:bg-ink-soft disabled:opacity-60";
export const primaryButton = `w-full ${submitButton}`;
