"use client";

import { useState, type ReactNode } from "react";
import { parseNumberField, type FieldParse, type FieldRules } from "../format";

export interface NumberFieldProps {
  id: string;
  label: string;
  value: string;
  onChange: (text: string) => void;
  unit?: string;
  error?: string | null;
  hint?: string;
}

/**
 * A labelled numeric text field (text, not type=number, so a user's partial
 * input is kept while typing). Room for the error line is always reserved.
 */
export function NumberField({ id, label, value, onChange, unit, error, hint }: NumberFieldProps) {
  const errorId = `${id}-error`;
  const hintId = `${id}-hint`;
  const describedBy = [hint ? hintId : null, errorId].filter(Boolean).join(" ");
  return (
    <div className="flex flex-col gap-1">
      <label htmlFor={id} className="text-sm font-medium text-ink">
        {label}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={id}
          name={id}
          type="text"
          inputMode="decimal"
          autoComplete="off"
          value={value}
          onChange={(e) => onChange(e.target.value)}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          className={`w-full rounded border px-2 py-1 font-mono text-sm ${error ? "border-sev-error" : "border-ink-faint"} focus:outline-none focus:ring-2 focus:ring-ink-soft`}
        />
        {unit ? <span className="shrink-0 text-sm text-ink-soft">{unit}</span> : null}
      </div>
      {hint ? (
        <p id={hintId} className="text-xs text-ink-soft">
          {hint}
        </p>
      ) : null}
      <p id={errorId} className="min-h-4 text-xs text-sev-error">
        {error ?? ""}
      </p>
    </div>
  );
}

/** The value, change handler and error line of a NumberField bound to a text and its parse. */
export function fieldInput(value: string, onChange: (text: string) => void, parsed: FieldParse) {
  return { value, onChange, error: parsed.ok ? null : parsed.message };
}

/** A field's text state with its parse (under `label` and `rules`) and the NumberField props bound to both. */
export function useNumberText(initial: string | (() => string), label: string, rules?: FieldRules) {
  const [text, setText] = useState(initial);
  const parsed = parseNumberField(text, label, rules);
  return { text, setText, parsed, input: fieldInput(text, setText, parsed) };
}

/** The helpers' two-column grid of fields. */
export function FieldGrid({ children }: { children: ReactNode }) {
  return <div className="grid grid-cols-1 gap-x-4 sm:grid-cols-2">{children}</div>;
}
