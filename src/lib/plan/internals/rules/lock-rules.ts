import type { FindingsCollector } from "../findings-collector";
import { fDB, fMHz } from "../format";
import type { OffsetState } from "../offset-state";
import { exceeds, fallsShort } from "../tolerance";

/**
 * The lock rules, neither of which depends on L (docs/plan-format.md §4.1 "The rules"):
 * `lock-inside-mode` for the chain and `lock-replica` per channel. Skipped
 * in map-only mode.
 */
export function lockRules(at: OffsetState, out: FindingsCollector): void {
  const { ctx, mapOnly } = at;
  if (mapOnly) return;
  if (fallsShort(ctx.fm, ctx.delta)) {
    out.add(
      "lock-inside-mode",
      null,
      `The lock modulation of laser ${ctx.laser.id} at ${fMHz(ctx.fm)} MHz is below the ${fMHz(ctx.delta)} MHz linewidth of resonator ${ctx.resonator.id}, so the lock sidebands fall inside the pump mode (${fMHz(ctx.delta - ctx.fm)} MHz short of clearing it).`,
      { modulationMHz: ctx.fm * 1000, linewidthMHz: ctx.delta * 1000 },
    );
  }
  const limit = ctx.plan.settings.replicaLimitDB;
  at.channels.forEach(({ ch }, i) => {
    if (exceeds(ch.lockReplicaDB, limit)) {
      out.add(
        "lock-replica",
        i,
        `The lock sidebands of laser ${ctx.laser.id} (±${fMHz(ctx.fm)} MHz, index ${ctx.beta}) bring ${fDB(ch.lockReplicaDB)} dB of the response of ${ch.channel.id} in from outside its passband; the limit is ${fDB(limit)} dB (${fDB(ch.lockReplicaDB - limit)} dB over).`,
        { lockReplicaDB: ch.lockReplicaDB, limitDB: limit },
      );
    }
  });
}
