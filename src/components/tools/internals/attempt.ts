import { OpticsInputError } from "@/lib/optics";

export type Attempt<T> = { ok: true; value: T } | { ok: false; message: string };

/** Run a calculation; an input outside a formula's domain becomes a message, not a crash. */
export function attempt<T>(calculate: () => T): Attempt<T> {
  try {
    return { ok: true, value: calculate() };
  } catch (e) {
    if (e instanceof OpticsInputError || e instanceof RangeError) return { ok: false, message: e.message };
    throw e;
  }
}
