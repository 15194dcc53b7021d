import type { LaneItem, LanePlanInput } from "../types";
import { ghz, ghzRange, mhz } from "./format";
import { item } from "./item";
import type { LaneIndex } from "./lane-index";
import { RF_ROWS } from "./rows";

/**
 * The operating envelope on the RF lane (docs/plan-format.md §12,
 * docs/decisions/029), drawn faintly beneath the nominal items:
 *
 * - `envelope-band`: for a channel whose IF filter passes its slot, the RF
 *   band it receives at the envelope's ends, each passband shifted by −D
 *   and +D (the LO shift moves the received RF band by s·u; the two ends
 *   are the same pair for either sideband). With the occupied-band filter
 *   LO drift does not move the RF band, so nothing is drawn.
 * - `mode-drift`: the wanted mode's passband over the chain's temperature
 *   control ±Te: its centre n·(fsr + t·φ) for t within ±Te, ± δ/2.
 *
 * Nothing is added for a chain with no drift and no temperature excursion.
 */
export function envelopeItems(plan: LanePlanInput, index: LaneIndex, items: LaneItem[]): void {
  for (const chain of plan.chains) {
    const laser = index.laserOf.get(chain.laser);
    const res = index.resonatorOf.get(chain.resonator);
    if (!laser || !res) continue;
    const te = chain.temperatureExcursionK ?? 0;
    const phiGHz = (res.fsrShiftMHzPerK ?? 0) / 1000;
    const move = chain.mode * Math.abs(phiGHz) * te;
    if (move > 0) {
      const delta = (laser.carrierTHz * 1000) / res.loadedQ;
      const centre = chain.mode * res.fsrGHz;
      items.push(
        item({
          id: `rf:mode-drift:${chain.id}`,
          lane: "rf",
          kind: "mode-drift",
          row: RF_ROWS.mode,
          lo: centre - move - delta / 2,
          hi: centre + move + delta / 2,
          chain: chain.id,
          label: `wanted mode ${chain.mode} of ${res.id} over the temperature control of chain ${chain.id}`,
          facts: () => [
            ["mode centre at ±Te", ghzRange(centre - move, centre + move)],
            ["temperature control", `±${ghz(te, 3)} K`],
            ["FSR shift", `${ghz(res.fsrShiftMHzPerK ?? 0, 3)} MHz/K`],
            ["centre moves", `±${mhz(move)}`],
          ],
        }),
      );
    }
  }
  for (const ch of plan.channels) {
    const chain = index.chainOf.get(ch.chain);
    const laser = chain ? index.laserOf.get(chain.laser) : undefined;
    if (!laser || laser.driftMHz <= 0 || (ch.ifFilter ?? "slot") !== "slot") continue;
    const D = laser.driftMHz / 1000;
    const B = ch.bandwidthMHz / 1000;
    const d = ch.dsbOffsetGHz ?? null;
    const centres = d === null ? [ch.centerGHz] : [ch.centerGHz - d, ch.centerGHz + d];
    centres.forEach((c, j) => {
      for (const [end, sign] of [
        ["lo", -1],
        ["hi", 1],
      ] as const) {
        const lo = c - B / 2 + sign * D;
        const hi = c + B / 2 + sign * D;
        items.push(
          item({
            id: `rf:envelope:${ch.id}:${j}:${end}`,
            lane: "rf",
            kind: "envelope-band",
            row: RF_ROWS.channel,
            lo,
            hi,
            chain: ch.chain,
            channel: ch.id,
            label: `channel ${ch.name} received at the envelope's ${sign < 0 ? "lower" : "upper"} end`,
            facts: () => [
              ["received band", ghzRange(lo, hi)],
              ["LO drift", `±${mhz(D)} (received band moves by ${sign < 0 ? "−" : "+"}${mhz(D)})`],
              ["IF filter", "nominal slot"],
            ],
          }),
        );
      }
    });
  }
}
