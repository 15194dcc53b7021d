import type { Plan } from "@/schemas/plan";
import { type ChainContext, chainContext } from "./chain-context";
import { imageAt, slotAt } from "./slot";

/**
 * Image rejection `R = 10·log10(∫W/∫Wᵢ)` in dB of one SSB channel with the
 * chain's LO at `L` (docs/plan-format.md §3.2 "Per channel", Image). Returns `+Infinity` when
 * `∫Wᵢ = 0` (nothing of the image gets in), and null when the channel has
 * no image figure at L (DSB channel, or the LO lies inside its band).
 *
 * For repeated calls build the context once with `chainContext` and use
 * `imageRejectionWithContext`.
 */
export function imageRejectionAt(plan: Plan, chainId: string, channelId: string, L: number): number | null {
  return imageRejectionWithContext(chainContext(plan, chainId), channelId, L);
}

/** `imageRejectionAt` on a prepared chain context. */
export function imageRejectionWithContext(ctx: ChainContext, channelId: string, L: number): number | null {
  const ch = ctx.channels.find((c) => c.channel.id === channelId);
  if (!ch) throw new Error(`Chain ${ctx.chain.id} has no channel "${channelId}"`);
  if (ch.dsb || !slotAt(ch, L, ctx.D)) return null;
  const image = imageAt(ctx, ch, L);
  if (!image) return null;
  return image.rejectionDB === null ? Infinity : image.rejectionDB;
}
