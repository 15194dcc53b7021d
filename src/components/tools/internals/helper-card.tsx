"use client";

import type { ReactNode } from "react";

export interface HelperCardProps {
  id: string;
  title: string;
  summary: string;
  children: ReactNode;
  /** Optional banner, e.g. "design estimate". */
  badge?: string;
}

/** Frame shared by every helper: title, one-line purpose, body. */
export function HelperCard({ id, title, summary, children, badge }: HelperCardProps) {
  return (
    <section
      aria-labelledby={`${id}-title`}
      className="rounded-lg border border-ink-faint bg-white p-5 shadow-sm"
      data-helper={id}
    >
      <header className="mb-4 flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={`${id}-title`} className="text-lg font-semibold text-ink">
          {title}
        </h2>
        {badge ? (
          <span className="rounded bg-sev-warning/10 px-2 py-0.5 text-xs font-medium text-sev-warning">{badge}</span>
        ) : null}
      </header>
      <p className="mb-4 text-sm text-ink-soft">{summary}</p>
      {children}
    </section>
  );
}

export interface WorkingProps {
  formulas: string[];
  inputs: Array<[label: string, value: string]>;
  sources: string[];
}

/** "Show your working": the formula, the inputs used and the sources. */
export function Working({ formulas, inputs, sources }: WorkingProps) {
  return (
    <details className="mt-4 rounded border border-ink-faint bg-ink-faint/30 p-3 text-sm" open>
      <summary className="cursor-pointer font-medium text-ink">Working</summary>
      <div className="mt-2 space-y-2">
        <div>
          <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Formula</h3>
          {formulas.map((f) => (
            <p key={f} className="font-mono text-xs text-ink">
              {f}
            </p>
          ))}
        </div>
        <div>
          <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Inputs</h3>
          <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-0.5 font-mono text-xs">
            {inputs.map(([label, value]) => (
              <div key={label} className="contents">
                <dt className="text-ink-soft">{label}</dt>
                <dd className="text-ink">{value}</dd>
              </div>
            ))}
          </dl>
        </div>
        <div>
          <h3 className="text-xs font-semibold uppercase tracking-wide text-ink-soft">Source</h3>
          <ul className="list-disc pl-5 text-xs text-ink-soft">
            {sources.map((s) => (
              <li key={s}>{s}</li>
            ))}
          </ul>
        </div>
      </div>
    </details>
  );
}

export interface ResultRowProps {
  label: string;
  value: string;
  unit?: string;
  emphasis?: boolean;
  testId?: string;
}

export function ResultRow({ label, value, unit, emphasis, testId }: ResultRowProps) {
  return (
    <div className="flex items-baseline justify-between gap-3 border-b border-ink-faint py-1 last:border-b-0">
      <span className="text-sm text-ink-soft">{label}</span>
      <span
        className={emphasis ? "font-mono text-base font-semibold text-ink" : "font-mono text-sm text-ink"}
        data-testid={testId}
      >
        {value}
        {unit ? <span className="ml-1 text-ink-soft">{unit}</span> : null}
      </span>
    </div>
  );
}

/** What every helper takes to hand its result to a form: the receiver (no button without one) and the button's label. */
export interface ApplyProps<T> {
  onApply?: (value: T) => void;
  applyLabel?: string;
}

export interface ApplyButtonProps {
  label: string;
  disabled: boolean;
  onClick: () => void;
}

export function ApplyButton({ label, disabled, onClick }: ApplyButtonProps) {
  return (
    <button
      type="button"
      onClick={onClick}
      disabled={disabled}
      className="mt-3 rounded bg-ink px-3 py-1.5 text-sm font-medium text-white disabled:cursor-not-allowed disabled:opacity-40"
    >
      {label}
    </button>
  );
}

export function ErrorLine({ message }: { message: string | null }) {
  return message ? (
    <p role="alert" className="mt-2 text-sm text-sev-error">
      {message}
    </p>
  ) : null;
}
