import type { FindingsCollector } from "../findings-collector";
import { fK } from "../format";
import { hasEnvelope, whereText } from "../envelope-text";
import type { OffsetState } from "../offset-state";
import { exceeds } from "../tolerance";

/**
 * The sensitivity rule (docs/plan-format.md §4.1 "The rules" and §12.5):
 * `nedt-unmet`, per channel with a slot and a required NEΔT, on the largest
 * NEΔT over the operating envelope. Skipped in map-only mode (no
 * sensitivity is worked out there).
 */
export function sensitivityRules(at: OffsetState, out: FindingsCollector): void {
  if (at.mapOnly) return;
  at.channels.forEach(({ ch, envelope }, i) => {
    const req = ch.channel.requiredNedtK;
    const nedt = envelope.nedt;
    if (!nedt || req === null || !exceeds(nedt.value, req)) return;
    const v = nedt.value;
    const where = hasEnvelope(at.box) ? ` ${whereText(at.box, nedt)}` : "";
    out.add(
      "nedt-unmet",
      i,
      `NEΔT of ${ch.channel.id} is ${fK(v)} K${where}, above the required ${fK(req)} K by ${fK(v - req)} K (${Number((v / req).toPrecision(3))}× the requirement${ch.channel.gainStability === 0 ? `; the integration time would have to grow about ${Number(((v / req) ** 2).toPrecision(3))}× to meet it` : ""}).`,
      { nedtK: v, requiredNedtK: req },
    );
  });
}
