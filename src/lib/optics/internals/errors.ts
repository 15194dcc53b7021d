/**
 * Thrown by the optics helpers for input outside a formula's domain. `field`
 * names the argument so a form can put the message beside the right input.
 */
export class OpticsInputError extends RangeError {
  readonly field: string;
  constructor(field: string, message: string) {
    super(`${field}: ${message}`);
    this.name = "OpticsInputError";
    this.field = field;
  }
}

export function requireFinite(field: string, value: number): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new OpticsInputError(field, "must be a finite number");
  }
  return value;
}

export function requirePositive(field: string, value: number): number {
  requireFinite(field, value);
  if (!(value > 0)) throw new OpticsInputError(field, "must be greater than 0");
  return value;
}

export function requireNonNegative(field: string, value: number): number {
  requireFinite(field, value);
  if (!(value >= 0)) throw new OpticsInputError(field, "must be 0 or more");
  return value;
}

export function requireInRange(field: string, value: number, min: number, max: number): number {
  requireFinite(field, value);
  if (value < min || value > max) {
    throw new OpticsInputError(field, `must be between ${min} and ${max}`);
  }
  return value;
}
