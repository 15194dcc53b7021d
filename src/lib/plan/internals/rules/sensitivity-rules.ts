import type { FindingsCollector } from "../findings-collector";
import { fK } from "../format";
import type { OffsetState } from "../offset-state";
import { exceeds } from "../tolerance";

/**
 * The sensitivity rule (docs/plan-format.md §4.1 "The rules"): `nedt-unmet`, per
 * channel with a slot and a required NEΔT. Skipped in map-only mode (no
 * sensitivity is worked out there).
 */
export function sensitivityRules(at: OffsetState, out: FindingsCollector): void {
  if (at.mapOnly) return;
  at.channels.forEach(({ ch, sensitivity }, i) => {
    const req = ch.channel.requiredNedtK;
    if (sensitivity && req !== null && exceeds(sensitivity.nedtK, req)) {
      out.add(
        "nedt-unmet",
        i,
        `NEΔT of ${ch.channel.id} is ${fK(sensitivity.nedtK)} K, above the required ${fK(req)} K by ${fK(sensitivity.nedtK - req)} K (${Number((sensitivity.nedtK / req).toPrecision(3))}× the requirement${ch.channel.gainStability === 0 ? `; the integration time would have to grow about ${Number(((sensitivity.nedtK / req) ** 2).toPrecision(3))}× to meet it` : ""}).`,
        { nedtK: sensitivity.nedtK, requiredNedtK: req },
      );
    }
  });
}
