import type { Spur } from "../../types";
import type { FindingsCollector } from "../findings-collector";
import { fBand, fGHz, fMHz, pair } from "../format";
import { type Interval, gap } from "../intervals";
import { foldInterval } from "../nyquist";
import type { ChannelAtOffset, OffsetState } from "../offset-state";
import type { SlotGeometry } from "../slot";
import { type SpurBand, errorSpursAt, infoSpurs } from "../spurs";
import { TOL } from "../tolerance";
import type { WorkCounter } from "../work-counter";

interface Hit {
  /** Index into ctx.channels. */
  victim: number;
  gapGHz: number;
  /** true when only the folded bands come within guard. */
  folded: boolean;
  foldedGapGHz: number | null;
}

/** Distance wording for a gap inside parentheses: "30 MHz away" / "touching" / "overlapping by 25 MHz". */
function closeness(gapGHz: number): string {
  if (gapGHz > 0) return `${fMHz(gapGHz)} MHz away`;
  if (gapGHz === 0) return "touching";
  return `overlapping by ${fMHz(-gapGHz)} MHz`;
}

const spurText = (b: SpurBand) =>
  b.band[0] === b.band[1]
    ? `${b.family} spur ${b.source} at ${fGHz(b.band[0])} GHz`
    : `${b.family} spur ${b.source} at ${fBand(b.band)}`;

/**
 * The spur rule `spur-in-slot` (docs/plan-format.md §5 "Spur families"): every
 * spur band of the chain at L (the error families, and in the full check
 * the harmonic and intermodulation families of the slots), the channels
 * each comes within guard of (directly or after folding), one error per
 * hit of an error family, and per victim one info finding each for the
 * harmonic and intermodulation products of order 3 or less. Returns every
 * kept spur (family in table order, then band).
 */
export function spurRules(at: OffsetState, out: FindingsCollector, work?: WorkCounter): Spur[] {
  const { ctx, L, mapOnly, channels, foldedOcc } = at;
  const chainId = ctx.chain.id;
  const guard = ctx.guard;
  const fs = ctx.sampleRate;
  const slots = channels.map((c) => c.geo);
  const bands: SpurBand[] = mapOnly
    ? errorSpursAt(ctx, L, work)
    : [...errorSpursAt(ctx, L, work), ...infoSpurs(ctx, slots)];
  const spurs: Spur[] = [];
  const errorHits: { band: SpurBand; hit: Hit }[] = [];
  // info hits per victim: [harmonic, intermod]
  const infoHits: { band: SpurBand; hit: Hit }[][][] = channels.map(() => [[], []]);
  for (const band of bands) {
    const hits: Hit[] = [];
    const hitIds: string[] = [];
    const foldedSpur = fs !== null ? foldInterval(band.band, fs) : null;
    for (let v = 0; v < channels.length; v++) {
      const c = channels[v] as ChannelAtOffset;
      if (!c.geo) continue;
      const direct = gap(band.band, c.geo.occupied);
      const fo = foldedOcc[v];
      const foldedGap = foldedSpur && fo ? gap(foldedSpur, fo) : null;
      const directHit = direct < guard - TOL;
      const foldedHit = foldedGap !== null && foldedGap < guard - TOL;
      if (directHit || foldedHit) {
        hits.push({ victim: v, gapGHz: direct, folded: !directHit, foldedGapGHz: foldedGap });
        hitIds.push(c.ch.channel.id);
      }
    }
    spurs.push({
      chain: chainId,
      family: band.family,
      order: band.order,
      bandGHz: pair(band.band),
      source: band.source,
      hits: hitIds,
    });
    for (const hit of hits) {
      if (band.family === "harmonic" || band.family === "intermod") {
        if (band.order > 3) continue;
        (infoHits[hit.victim] as { band: SpurBand; hit: Hit }[][])[band.family === "harmonic" ? 0 : 1]!.push({
          band,
          hit,
        });
      } else {
        errorHits.push({ band, hit });
      }
    }
  }
  for (const { band, hit } of errorHits) {
    const c = channels[hit.victim] as ChannelAtOffset;
    const occ = (c.geo as SlotGeometry).occupied;
    const effGap = hit.folded ? (hit.foldedGapGHz as number) : hit.gapGHz;
    const where = hit.folded
      ? ` after folding at the ${fGHz(fs as number)} GHz sample rate (folded spur ${fBand(foldInterval(band.band, fs as number))}, folded band ${fBand(foldedOcc[hit.victim] as Interval)})`
      : "";
    const relation =
      effGap > 0
        ? `comes within ${fMHz(effGap)} MHz of the ${spurText(band)}${where}`
        : `overlaps the ${spurText(band)}${effGap < 0 ? ` by ${fMHz(-effGap)} MHz` : ""}${where}`;
    const message = `Occupied IF band ${fBand(occ)} of ${c.ch.channel.id} ${relation}; the guard is ${fMHz(guard)} MHz (${fMHz(guard - effGap)} MHz short).`;
    out.add("spur-in-slot", hit.victim, message, {
      family: band.family,
      order: band.order,
      source: band.source,
      spurGHz: pair(band.band),
      occupiedGHz: pair(occ),
      gapMHz: hit.gapGHz * 1000,
      folded: hit.folded,
      foldedGapMHz: hit.foldedGapGHz === null ? null : hit.foldedGapGHz * 1000,
      guardMHz: guard * 1000,
    });
  }
  for (const family of ["harmonic", "intermod"] as const) {
    channels.forEach((c, v) => {
      const list = infoHits[v]?.[family === "harmonic" ? 0 : 1];
      if (!list || list.length === 0 || !c.geo) return;
      const occ = c.geo.occupied;
      const shown = list
        .slice(0, 4)
        .map(
          ({ band, hit }) =>
            `${band.source} (${fBand(band.band)}, ${closeness(hit.folded ? (hit.foldedGapGHz as number) : hit.gapGHz)}${hit.folded ? " after folding" : ""})`,
        );
      out.add(
        "spur-in-slot",
        v,
        `${list.length} ${family === "harmonic" ? "harmonic" : "intermodulation"} product${list.length === 1 ? "" : "s"} of order 3 or less come${list.length === 1 ? "s" : ""} within the ${fMHz(guard)} MHz guard of occupied IF band ${fBand(occ)} of ${c.ch.channel.id}: ${shown.join("; ")}${list.length > 4 ? "; …" : ""}. Only IF-chain nonlinearity makes these; check its intercept points.`,
        {
          family,
          guardMHz: guard * 1000,
          occupiedGHz: pair(occ),
          products: list.map(({ band, hit }) => ({
            source: band.source,
            order: band.order,
            spurGHz: pair(band.band),
            gapMHz: hit.gapGHz * 1000,
            folded: hit.folded,
            foldedGapMHz: hit.foldedGapGHz === null ? null : hit.foldedGapGHz * 1000,
          })),
        },
        "info",
      );
    });
  }
  return spurs;
}
