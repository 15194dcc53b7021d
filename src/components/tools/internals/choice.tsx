"use client";

/**
 * A group of radio buttons choosing one of a few values, with its legend
 * (shown, or for screen readers only).
 */
export function Choice<T extends string>({
  name,
  legend,
  showLegend = false,
  options,
  value,
  onChange,
  className = "mb-2 flex gap-4 text-sm",
}: {
  name: string;
  legend: string;
  showLegend?: boolean;
  /** Each value with its label, in order. */
  options: readonly (readonly [T, string])[];
  value: T;
  onChange: (value: T) => void;
  className?: string;
}) {
  return (
    <fieldset className={className}>
      <legend className={showLegend ? "mb-1 text-sm font-medium text-ink" : "sr-only"}>{legend}</legend>
      {options.map(([v, label]) => (
        <label key={v} className="flex items-center gap-1">
          <input type="radio" name={name} checked={value === v} onChange={() => onChange(v)} />
          {label}
        </label>
      ))}
    </fieldset>
  );
}
