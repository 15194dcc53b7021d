/**
 * Pure formatting and field-parsing used by the helper components. Numbers
 * are shown with a true minus sign (U+2212) and never as "-0".
 */

const MINUS = "\u2212";

function clean(text: string): string {
  return text.startsWith("-") ? MINUS + text.slice(1) : text;
}

/** Fixed decimals; "—" for a non-finite value; −0 shows as 0. */
export function formatFixed(value: number, decimals: number): string {
  if (!Number.isFinite(value)) return "—";
  const text = value.toFixed(decimals);
  return Number(text) === 0 ? text.replace(/^-/, "") : clean(text);
}

/** Fixed decimals with an explicit sign: "+2.500", "−0.125", "0.000". */
export function formatSigned(value: number, decimals: number): string {
  const text = formatFixed(value, decimals);
  if (text === "—" || Number(value.toFixed(decimals)) === 0) return text;
  return value > 0 ? `+${text}` : text;
}

/**
 * Significant digits, switching to scientific notation (with ×10^n written
 * as "e") outside 1e-3 … 1e6: "1.93e8", "0.0150", "295.6".
 */
export function formatSignificant(value: number, digits: number): string {
  if (!Number.isFinite(value)) return "—";
  if (value === 0) return "0";
  const abs = Math.abs(value);
  if (abs >= 1e6 || abs < 1e-3) {
    const [mantissa = "", exponent = ""] = value.toExponential(digits - 1).split("e");
    return clean(`${mantissa}e${exponent.replace("+", "")}`).replace("e-", `e${MINUS}`);
  }
  return clean(value.toPrecision(digits));
}

/**
 * Round up to a multiple of step (a budget is never rounded down), with the
 * float residue of the division removed first so 21.7 stays 21.7.
 */
export function ceilToStep(value: number, step: number): number {
  if (!Number.isFinite(value) || !(step > 0)) return Number.NaN;
  const quotient = Number((value / step).toPrecision(12));
  const decimals = Math.max(0, -Math.floor(Math.log10(step)) + (step.toString().includes(".") ? 1 : 0));
  // a positive value whose quotient underflows to 0 still needs one step
  const steps = value > 0 ? Math.max(1, Math.ceil(quotient)) : Math.ceil(quotient);
  return Number((steps * step).toFixed(Math.min(decimals + 2, 15)));
}

export type FieldParse = { ok: true; value: number } | { ok: false; message: string };

export interface FieldRules {
  min?: number;
  /** when true, the value must be strictly greater than min */
  exclusiveMin?: boolean;
  max?: number;
  integer?: boolean;
}

/**
 * Read a number typed in a form field. Accepts a decimal comma, surrounding
 * spaces, a Unicode minus and exponents ("1e8"); the message names the field.
 */
export function parseNumberField(text: string, label: string, rules: FieldRules = {}): FieldParse {
  const trimmed = text
    .trim()
    .replace(/\u2212/g, "-")
    .replace(/^(-?\d*),(\d+)$/, "$1.$2");
  if (trimmed === "") return { ok: false, message: `${label} is required` };
  if (!/^[-+]?(\d+(\.\d*)?|\.\d+)([eE][-+]?\d+)?$/.test(trimmed)) {
    return { ok: false, message: `${label} must be a number` };
  }
  const value = Number(trimmed);
  if (!Number.isFinite(value)) return { ok: false, message: `${label} is too large` };
  if (rules.integer && !Number.isInteger(value)) return { ok: false, message: `${label} must be a whole number` };
  if (rules.min !== undefined) {
    if (rules.exclusiveMin ? !(value > rules.min) : !(value >= rules.min)) {
      return {
        ok: false,
        message: `${label} must be ${rules.exclusiveMin ? "greater than" : "at least"} ${rules.min}`,
      };
    }
  }
  if (rules.max !== undefined && value > rules.max)
    return { ok: false, message: `${label} must be at most ${rules.max}` };
  return { ok: true, value };
}

/**
 * Carrier range (THz) inside the LiNbO3 Sellmeier fits' 0.4–5 µm
 * (c/5 µm = 59.96 THz, c/0.4 µm = 749.48 THz), rounded inwards.
 */
export const LN_FIT_CARRIER_THZ: FieldRules = { min: 60, max: 749 };
