import { protectedBandHolding } from "@/lib/reference";
import type { FindingsCollector } from "../findings-collector";
import { fBand, pair } from "../format";
import type { OffsetState } from "../offset-state";

/**
 * The regulatory rule (docs/plan-format.md §4.1 "The rules"): `in-protected-band`, per
 * channel with a passband inside a band of Radio Regulations No. 5.340
 * (info; L-independent, skipped in map-only mode).
 */
export function regulatoryRules(at: OffsetState, out: FindingsCollector): void {
  if (at.mapOnly) return;
  at.channels.forEach(({ ch }, i) => {
    const prot = ch.passbands.map((p) => ({ p, band: protectedBandHolding(p) })).find((x) => x.band !== null);
    if (prot && prot.band) {
      out.add(
        "in-protected-band",
        i,
        `Passband ${fBand(prot.p)} of ${ch.channel.id} lies inside ${fBand(prot.band.bandGHz)}, where the Radio Regulations (No. 5.340) prohibit all emissions${prot.band.fromMemory ? " (band edges to be checked against the current edition of the Radio Regulations)" : ""}; the receiver itself does not transmit, but keep LO light out of the resonator so nothing is re-radiated there.`,
        {
          passbandGHz: pair(prot.p),
          protectedGHz: pair(prot.band.bandGHz),
          source: prot.band.source,
          fromMemory: prot.band.fromMemory,
        },
      );
    }
  });
}
