"use client";

import type { Severity } from "@/queries/types";

export const LASER_SAFETY_TEXT =
  "Class 3B/4 1550 nm sources may be in use: follow IEC 60825-1 and your site's laser safety officer; figures here are planning values.";

export const SENSITIVITY_TEXT =
  "Sensitivity figures (NEΔT, radiometric bandwidth) are design estimates, not calibration.";

/** The short laser-safety caution shown wherever optical power is entered or shown. */
export function LaserSafetyNote({ className = "" }: { className?: string }) {
  return (
    <p
      role="note"
      data-caution="laser-safety"
      className={`flex gap-2 rounded border border-sev-warning/40 bg-amber-50 px-2.5 py-1.5 text-xs leading-snug text-sev-warning ${className}`}
    >
      <span aria-hidden className="font-bold">
        ⚠
      </span>
      <span>
        <span className="font-semibold">Laser safety. </span>
        {LASER_SAFETY_TEXT}
      </span>
    </p>
  );
}

const sevStyle: Record<Severity, string> = {
  error: "bg-sev-error text-white",
  warning: "bg-amber-100 text-sev-warning ring-1 ring-inset ring-sev-warning/40",
  info: "bg-slate-100 text-sev-info ring-1 ring-inset ring-sev-info/30",
};

export function SeverityBadge({ severity }: { severity: Severity }) {
  return (
    <span
      className={`inline-flex min-w-[4.5rem] justify-center rounded px-1.5 py-0.5 text-[11px] font-semibold uppercase tracking-wide ${sevStyle[severity]}`}
    >
      {severity}
    </span>
  );
}

export function CountPill({ n, severity }: { n: number; severity: Severity }) {
  if (n === 0) return <span className="tabular-nums text-ink-soft/60">0</span>;
  const style = severity === "error" ? "text-sev-error" : severity === "warning" ? "text-sev-warning" : "text-sev-info";
  return <span className={`font-semibold tabular-nums ${style}`}>{n}</span>;
}

export function Card({
  title,
  actions,
  children,
  className = "",
}: {
  title: React.ReactNode;
  actions?: React.ReactNode;
  children: React.ReactNode;
  className?: string;
}) {
  return (
    <section className={`rounded-md border border-ink/15 bg-white ${className}`}>
      <header className="flex items-center justify-between gap-2 border-b border-ink/10 px-4 py-2.5">
        <h2 className="text-sm font-semibold tracking-tight">{title}</h2>
        {actions ? <div className="flex items-center gap-2">{actions}</div> : null}
      </header>
      <div className="px-4 py-3">{children}</div>
    </section>
  );
}

export const buttonClass = {
  primary:
    "inline-flex items-center gap-1 rounded bg-ink px-3 py-1.5 text-sm font-medium text-white hover:bg-ink-soft disabled:opacity-50",
  secondary:
    "inline-flex items-center gap-1 rounded border border-ink/30 bg-white px-3 py-1.5 text-sm font-medium text-ink hover:bg-ink-faint disabled:opacity-50",
  quiet: "inline-flex items-center gap-1 rounded px-2 py-1 text-sm text-ink-soft hover:bg-ink-faint hover:text-ink",
  danger:
    "inline-flex items-center gap-1 rounded border border-sev-error/40 px-3 py-1.5 text-sm font-medium text-sev-error hover:bg-red-50 disabled:opacity-50",
};

export function ErrorNote({ title, children }: { title: string; children?: React.ReactNode }) {
  return (
    <div role="alert" className="rounded border border-sev-error/40 bg-red-50 px-3 py-2 text-sm text-sev-error">
      <p className="font-semibold">{title}</p>
      {children ? <div className="mt-0.5 text-ink">{children}</div> : null}
    </div>
  );
}

export function Spinner({ label }: { label: string }) {
  return (
    <span role="status" className="inline-flex items-center gap-2 text-sm text-ink-soft">
      <span aria-hidden className="h-3.5 w-3.5 animate-spin rounded-full border-2 border-ink/20 border-t-ink" />
      {label}
    </span>
  );
}

export function Empty({ children }: { children: React.ReactNode }) {
  return <p className="py-3 text-sm text-ink-soft">{children}</p>;
}
