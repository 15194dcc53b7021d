import { type Plan, type PlanInput, parsePlan } from "@/schemas/plan";
import sharedLaserDocument from "../../../docs/examples/shared-laser.plan.json";

/**
 * The shared-laser demo plan (docs/examples/shared-laser.plan.json,
 * invented demo data): one laser pair LP1 serving chains A180, B240 and
 * C320 by a 200 ms schedule. Every call returns a fresh copy.
 */
export function sharedLaserInput(): PlanInput {
  return structuredClone(sharedLaserDocument) as PlanInput;
}

/** Parse a plan document, failing loudly when it is not valid. */
export function parsed(input: unknown): Plan {
  const r = parsePlan(input);
  if (!r.ok) throw new Error(`not a valid plan: ${JSON.stringify(r.issues)}`);
  return r.plan;
}

/** The shared-laser plan with its schedule's dwells set to `dwellsMs` (and other edits). */
export function withDwells(dwellsMs: readonly number[], edit: (d: PlanInput) => void = () => {}): Plan {
  const d = sharedLaserInput();
  const s = d.lasers[0]!.schedule!;
  s.dwells.forEach((dw, j) => (dw.dwellMs = dwellsMs[j] as number));
  edit(d);
  return parsed(d);
}
