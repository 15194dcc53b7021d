import type { Finding, FindingCode, JsonValue, Severity, Spur } from "../types";
import { RULE_SEVERITY, ruleRank } from "../types";
import { protectedBandHolding } from "@/lib/reference";
import type { ChainContext, ChannelContext } from "./chain-context";
import { fBand, fDB, fGHz, fK, fMHz, fMW, pair } from "./format";
import { type Interval, absInterval, gap, insideOf, withinGuard } from "./intervals";
import { foldInterval, interiorNyquistEdge, nyquistZone } from "./nyquist";
import {
  type ImageFigures,
  type Sensitivity,
  type SlotGeometry,
  bandHoldingLo,
  imageAt,
  sensitivityAt,
  slotAt,
} from "./slot";
import { type SpurBand, errorSpursAt, infoSpurs } from "./spurs";
import { TOL, exceeds, fallsShort } from "./tolerance";

/** What to evaluate at an offset. */
export interface EvaluateOptions {
  /**
   * Only the error rules that depend on L (those that shape the feasibility
   * map): skips the harmonic and intermodulation families, sensitivity and
   * every rule that does not depend on L. Default false.
   */
  mapOnly?: boolean;
}

/** Per-channel figures at the evaluated offset. */
export interface ChannelAtOffset {
  ch: ChannelContext;
  /** Null when the LO lies strictly inside one of the channel's optical bands. */
  geo: SlotGeometry | null;
  /** Null without a slot, and in map-only mode. */
  sensitivity: Sensitivity | null;
  /** Null for DSB channels and without a slot. */
  image: ImageFigures | null;
}

export interface ChainEvaluation {
  L: number;
  channels: ChannelAtOffset[];
  /** Every finding of the chain and its channels, in contract order. */
  findings: Finding[];
  /** Every kept spur of the chain (family in table order, then band); in map-only mode the error families only. */
  spurs: Spur[];
}

interface Hit {
  /** Index into ctx.channels. */
  victim: number;
  gapGHz: number;
  /** true when only the folded bands come within guard. */
  folded: boolean;
  foldedGapGHz: number | null;
}

/**
 * Make freshly built finding data JSON-safe in place: −0 becomes 0 and
 * non-finite numbers (only reachable with absurd inputs) become null.
 */
function jsonSafeInPlace(v: { [k: string]: JsonValue } | JsonValue[]): void {
  const fix = (x: JsonValue): JsonValue => {
    if (typeof x === "number") return Number.isFinite(x) ? (x === 0 ? 0 : x) : null;
    if (x !== null && typeof x === "object") jsonSafeInPlace(x);
    return x;
  };
  if (Array.isArray(v)) {
    for (let i = 0; i < v.length; i++) v[i] = fix(v[i] as JsonValue);
  } else {
    for (const k in v) v[k] = fix(v[k] as JsonValue);
  }
}

/** How far outside `outer` the interval `inner` reaches (GHz, ≥ 0). */
function outsideBy(inner: Interval, outer: Interval): number {
  return Math.max(0, outer[0] - inner[0], inner[1] - outer[1]);
}

/** Distance wording for a gap inside parentheses: "30 MHz away" / "touching" / "overlapping by 25 MHz". */
function closeness(gapGHz: number): string {
  if (gapGHz > 0) return `${fMHz(gapGHz)} MHz away`;
  if (gapGHz === 0) return "touching";
  return `overlapping by ${fMHz(-gapGHz)} MHz`;
}

/**
 * Evaluate every rule of one chain at LO offset L (GHz). The chain's own
 * `loOffsetGHz` is ignored; pass it for the plan as written.
 */
export function evaluateChain(ctx: ChainContext, L: number, options: EvaluateOptions = {}): ChainEvaluation {
  const mapOnly = options.mapOnly === true;
  const chainId = ctx.chain.id;
  const guard = ctx.guard;
  const fs = ctx.sampleRate;
  const chainFindings: Finding[] = [];
  const perChannel: Finding[][] = ctx.channels.map(() => []);
  const add = (
    code: FindingCode,
    channelIndex: number | null,
    message: string,
    data: { [k: string]: JsonValue },
    severity: Severity = RULE_SEVERITY[code],
  ) => {
    const f: Finding = {
      code,
      severity,
      chain: chainId,
      channel: channelIndex === null ? null : (ctx.channels[channelIndex] as ChannelContext).channel.id,
      message,
      data,
    };
    jsonSafeInPlace(data);
    if (channelIndex === null) chainFindings.push(f);
    else (perChannel[channelIndex] as Finding[]).push(f);
  };

  // ---- geometry at L
  const channels: ChannelAtOffset[] = ctx.channels.map((ch) => {
    const geo = slotAt(ch, L, ctx.D);
    const sensitivity = geo && !mapOnly ? sensitivityAt(ctx, ch, geo, L) : null;
    const image = geo ? imageAt(ctx, ch, L) : null;
    return { ch, geo, sensitivity, image };
  });
  const foldedOcc: (Interval | null)[] = channels.map((c) =>
    c.geo && fs !== null ? foldInterval(absInterval(c.geo.occupied), fs) : null,
  );

  // ---- chain-level rules
  const window: Interval = [L - ctx.D, L + ctx.D];
  if (!ctx.reach.some((r) => insideOf(window, r))) {
    let short = Infinity;
    for (const r of ctx.reach) short = Math.min(short, outsideBy(window, r));
    const reachText = ctx.reach.length ? ctx.reach.map((r) => fBand(r)).join(", ") : "no interval at all";
    add(
      "lo-uncovered",
      null,
      ctx.reach.length
        ? `The LO at ${fGHz(L)} GHz with its ±${fMHz(ctx.D)} MHz drift spans ${fBand(window)}, which is not inside one reach interval of laser ${ctx.laser.id} (${reachText}); it reaches ${fMHz(short)} MHz beyond the nearest one.`
        : `Laser ${ctx.laser.id} has no reach interval, so the LO at ${fGHz(L)} GHz cannot be set.`,
      {
        loGHz: L,
        driftGHz: ctx.D,
        windowGHz: pair(window),
        reachGHz: ctx.reach.map(pair),
        shortGHz: Number.isFinite(short) ? short : null,
      },
    );
  }
  if (!mapOnly && ctx.step > 0) {
    const nearest = Math.round(L / ctx.step) * ctx.step;
    const off = Math.abs(L - nearest);
    if (off > TOL) {
      add(
        "lo-off-step",
        null,
        `The LO offset ${fGHz(L)} GHz is not a multiple of the ${fMHz(ctx.step)} MHz tuning step of laser ${ctx.laser.id}; the nearest settable offset is ${fGHz(nearest)} GHz (${fMHz(off)} MHz away).`,
        { loGHz: L, stepMHz: ctx.laser.stepMHz, nearestGHz: nearest, offMHz: off * 1000 },
      );
    }
  }
  if (!mapOnly && fs !== null) {
    const edge = interiorNyquistEdge(ctx.detectorBand, fs);
    if (edge !== null) {
      const zones = nyquistZone(ctx.detectorBand[1], fs) - nyquistZone(ctx.detectorBand[0], fs) + 1;
      add(
        "noise-folding",
        null,
        `Detector ${ctx.detector.id} passes ${fBand(ctx.detectorBand)}, which spans ${zones} Nyquist zones of the ${fGHz(fs)} GHz sample rate (edge at ${fGHz(edge)} GHz); its noise folds onto every slot. Narrow the detector band to the anti-alias filter, inside one zone.`,
        { detectorGHz: pair(ctx.detectorBand), sampleRateGHz: fs, nyquistEdgeGHz: edge, zones },
      );
    }
  }
  if (!mapOnly) {
    if (fallsShort(ctx.fm, ctx.delta)) {
      add(
        "lock-inside-mode",
        null,
        `The lock modulation of laser ${ctx.laser.id} at ${fMHz(ctx.fm)} MHz is below the ${fMHz(ctx.delta)} MHz linewidth of resonator ${ctx.resonator.id}, so the lock sidebands fall inside the pump mode (${fMHz(ctx.delta - ctx.fm)} MHz short of clearing it).`,
        { modulationMHz: ctx.fm * 1000, linewidthMHz: ctx.delta * 1000 },
      );
    }
    if (exceeds(ctx.carrierMW, ctx.loMW)) {
      add(
        "carrier-dominates-lo",
        null,
        `Up to ${fMW(ctx.carrierMW)} mW of residual carrier reaches detector ${ctx.detector.id}, ${fDB(10 * Math.log10(ctx.carrierMW / ctx.loMW))} dB more than the ${fMW(ctx.loMW)} mW LO, so the carrier, not the LO, sets the shot-noise floor; that much more carrier rejection or LO power would balance them.`,
        { carrierMW: ctx.carrierMW, loMW: ctx.loMW },
      );
    }
    if (exceeds(ctx.pdMW, ctx.detector.maxInputMW)) {
      add(
        "pd-overload",
        null,
        `Each photodiode of detector ${ctx.detector.id} receives up to ${fMW(ctx.pdMW)} mW ((carrier ${fMW(ctx.carrierMW)} mW + LO ${fMW(ctx.loMW)} mW)/2), above its ${fMW(ctx.detector.maxInputMW)} mW limit by ${fMW(ctx.pdMW - ctx.detector.maxInputMW)} mW.`,
        { pdInputMW: ctx.pdMW, maxInputMW: ctx.detector.maxInputMW, carrierMW: ctx.carrierMW, loMW: ctx.loMW },
      );
    }
  }

  // ---- per-channel rules that need no other channel
  const halfDelta = ctx.delta / 2;
  channels.forEach(({ ch, geo }, i) => {
    const id = ch.channel.id;
    if (!geo) {
      const band = bandHoldingLo(ch, L) as Interval;
      const margin = Math.min(L - band[0], band[1] - L);
      add(
        "lo-in-band",
        i,
        `The LO at ${fGHz(L)} GHz lies inside the optical band ${fBand(band)} of ${id}, so the channel has no IF slot; the LO must move at least ${fMHz(margin)} MHz to reach the band edge.`,
        { loGHz: L, bandGHz: pair(band), marginGHz: margin },
      );
    }
    if (!mapOnly && ch.dsb) {
      const centre = ctx.s * ch.channel.centerGHz;
      const off = Math.abs(L - centre);
      const allowed = Math.max(ctx.step / 2, 0.0005);
      if (exceeds(off, allowed)) {
        add(
          "dsb-lo-off-centre",
          i,
          `The LO at ${fGHz(L)} GHz is ${fMHz(off)} MHz from the centre ${fGHz(centre)} GHz of the double-sideband channel ${id}; at most ${fMHz(allowed)} MHz is allowed (${fMHz(off - allowed)} MHz too far), and the off-centre LO widens the IF slot.`,
          { loGHz: L, centreGHz: centre, offsetMHz: off * 1000, allowedMHz: allowed * 1000 },
        );
      }
    }
    if (!mapOnly) {
      const outside = ch.passbands.filter((p) => !insideOf(p, ctx.rfInput));
      if (outside.length) {
        const worst = Math.max(...outside.map((p) => outsideBy(p, ctx.rfInput)));
        add(
          "band-outside-rf-input",
          i,
          `Passband ${outside.map(fBand).join(" and ")} of ${id} is not inside the RF input ${fBand(ctx.rfInput)} of chain ${chainId}; it reaches ${fMHz(worst)} MHz beyond it.`,
          { passbandsGHz: outside.map(pair), rfInputGHz: pair(ctx.rfInput), outsideMHz: worst * 1000 },
        );
      }
      const detuned = ch.centres
        .map((f) => ({ f, detune: Math.abs(ctx.s * f - ctx.modeCentre) }))
        .filter((d) => exceeds(d.detune, halfDelta));
      if (detuned.length) {
        const worst = detuned.reduce((p, q) => (q.detune > p.detune ? q : p));
        const response = 1 / (1 + ((2 * worst.detune) / ctx.delta) ** 2);
        add(
          "mode-detuned",
          i,
          `Passband centre ${fGHz(worst.f)} GHz of ${id} is ${fMHz(worst.detune)} MHz from the centre of mode ${ctx.nStar} (${fGHz(Math.abs(ctx.modeCentre))} GHz), more than half the ${fMHz(ctx.delta)} MHz linewidth (${fMHz(worst.detune - halfDelta)} MHz too far); the mode passes only ${fDB(10 * Math.log10(response))} dB there.`,
          {
            passbandCentresGHz: detuned.map((d) => d.f),
            modeCentreGHz: Math.abs(ctx.modeCentre),
            detuningMHz: worst.detune * 1000,
            halfLinewidthMHz: halfDelta * 1000,
            responseDB: 10 * Math.log10(response),
          },
        );
      }
      if (exceeds(ch.B, ctx.delta)) {
        add(
          "band-wider-than-mode",
          i,
          `The ${fMHz(ch.B)} MHz passband of ${id} is wider than the ${fMHz(ctx.delta)} MHz mode linewidth (by ${fMHz(ch.B - ctx.delta)} MHz): the mode, not the channel filter, shapes the response.`,
          { bandwidthMHz: ch.B * 1000, linewidthMHz: ctx.delta * 1000 },
        );
      }
    }
    if (geo && !insideOf(geo.occupied, ctx.detectorBand)) {
      add(
        "if-outside-detector",
        i,
        `Occupied IF band ${fBand(geo.occupied)} of ${id} is not inside the ${fBand(ctx.detectorBand)} band of detector ${ctx.detector.id}; it reaches ${fMHz(outsideBy(geo.occupied, ctx.detectorBand))} MHz beyond it.`,
        {
          occupiedGHz: pair(geo.occupied),
          detectorGHz: pair(ctx.detectorBand),
          outsideMHz: outsideBy(geo.occupied, ctx.detectorBand) * 1000,
        },
      );
    }
  });

  // ---- pair rules: slot-overlap
  const sharedIf = ctx.chain.sharedIf;
  if (!(mapOnly && sharedIf)) {
    for (let i = 0; i < channels.length; i++) {
      const gi = (channels[i] as ChannelAtOffset).geo;
      if (!gi) continue;
      for (let j = i + 1; j < channels.length; j++) {
        const gj = (channels[j] as ChannelAtOffset).geo;
        if (!gj || !withinGuard(gi.occupied, gj.occupied, guard)) continue;
        const g = gap(gi.occupied, gj.occupied);
        const a = (channels[i] as ChannelAtOffset).ch.channel.id;
        const b = (channels[j] as ChannelAtOffset).ch.channel.id;
        add(
          "slot-overlap",
          i,
          `Occupied IF bands of ${a} (${fBand(gi.occupied)}) and ${b} (${fBand(gj.occupied)}) ${g >= 0 ? `are ${fMHz(g)} MHz apart` : `overlap by ${fMHz(-g)} MHz`}; the guard is ${fMHz(guard)} MHz (${fMHz(guard - g)} MHz short)${sharedIf ? "; the chain cuts its channels from one shared IF, so this is a warning" : ""}.`,
          {
            other: b,
            occupiedGHz: pair(gi.occupied),
            otherOccupiedGHz: pair(gj.occupied),
            gapMHz: g * 1000,
            guardMHz: guard * 1000,
          },
          sharedIf ? "warning" : "error",
        );
      }
    }
  }

  // ---- image-response
  const required = ctx.plan.settings.imageRejectionDB;
  channels.forEach(({ ch, image }, i) => {
    if (!image || image.rejectionDB === null || !fallsShort(image.rejectionDB, required)) return;
    add(
      "image-response",
      i,
      `The image band ${fBand(image.imageGHz)} of ${ch.channel.id} is rejected by only ${fDB(image.rejectionDB)} dB; at least ${fDB(required)} dB is required (${fDB(required - image.rejectionDB)} dB short).`,
      { imageGHz: pair(image.imageGHz), imageRejectionDB: image.rejectionDB, requiredDB: required },
    );
  });

  // ---- spurs and their hits
  const slots = channels.map((c) => c.geo);
  const bands: SpurBand[] = mapOnly ? errorSpursAt(ctx, L) : [...errorSpursAt(ctx, L), ...infoSpurs(ctx, slots)];
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
  const spurText = (b: SpurBand) =>
    b.band[0] === b.band[1]
      ? `${b.family} spur ${b.source} at ${fGHz(b.band[0])} GHz`
      : `${b.family} spur ${b.source} at ${fBand(b.band)}`;
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
    add("spur-in-slot", hit.victim, message, {
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
      add(
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

  // ---- sampled IF: nyquist-straddle, alias-overlap
  if (fs !== null) {
    // the interior of O itself (plan-format.md); folding below uses |O|
    const straddles = channels.map((c) => (c.geo ? interiorNyquistEdge(c.geo.occupied, fs) : null));
    channels.forEach((c, i) => {
      const edge = straddles[i];
      if (!c.geo || edge === null || edge === undefined) return;
      const occ = c.geo.occupied;
      const need = Math.min(edge - occ[0], occ[1] - edge);
      add(
        "nyquist-straddle",
        i,
        `Occupied IF band ${fBand(occ)} of ${c.ch.channel.id} contains the Nyquist edge ${fGHz(edge)} GHz of the ${fGHz(fs)} GHz sample rate, so part of it folds onto the rest; it must move at least ${fMHz(need)} MHz to clear the edge.`,
        { occupiedGHz: pair(occ), sampleRateGHz: fs, nyquistEdgeGHz: edge, moveMHz: need * 1000 },
      );
    });
    for (let i = 0; i < channels.length; i++) {
      const ci = channels[i] as ChannelAtOffset;
      const fi = foldedOcc[i];
      if (!ci.geo || !fi || straddles[i] !== null) continue;
      const oi = absInterval(ci.geo.occupied);
      const zi = nyquistZone((oi[0] + oi[1]) / 2, fs);
      for (let j = i + 1; j < channels.length; j++) {
        const cj = channels[j] as ChannelAtOffset;
        const fj = foldedOcc[j];
        if (!cj.geo || !fj || straddles[j] !== null) continue;
        const oj = absInterval(cj.geo.occupied);
        const zj = nyquistZone((oj[0] + oj[1]) / 2, fs);
        if (zi === zj || !withinGuard(fi, fj, guard)) continue;
        const g = gap(fi, fj);
        add(
          "alias-overlap",
          i,
          `After sampling at ${fGHz(fs)} GHz, ${ci.ch.channel.id} (Nyquist zone ${zi + 1}, folded to ${fBand(fi)}) and ${cj.ch.channel.id} (zone ${zj + 1}, folded to ${fBand(fj)}) ${g >= 0 ? `are ${fMHz(g)} MHz apart` : `overlap by ${fMHz(-g)} MHz`}; the guard is ${fMHz(guard)} MHz (${fMHz(guard - g)} MHz short).`,
          {
            other: cj.ch.channel.id,
            foldedGHz: pair(fi),
            otherFoldedGHz: pair(fj),
            zone: zi + 1,
            otherZone: zj + 1,
            gapMHz: g * 1000,
            guardMHz: guard * 1000,
          },
        );
      }
    }
  }

  // ---- L-independent per-channel rules
  if (!mapOnly) {
    const limit = ctx.plan.settings.replicaLimitDB;
    channels.forEach(({ ch, sensitivity }, i) => {
      const id = ch.channel.id;
      if (exceeds(ch.lockReplicaDB, limit)) {
        add(
          "lock-replica",
          i,
          `The lock sidebands of laser ${ctx.laser.id} (±${fMHz(ctx.fm)} MHz, index ${ctx.beta}) bring ${fDB(ch.lockReplicaDB)} dB of the response of ${id} in from outside its passband; the limit is ${fDB(limit)} dB (${fDB(ch.lockReplicaDB - limit)} dB over).`,
          { lockReplicaDB: ch.lockReplicaDB, limitDB: limit },
        );
      }
      const req = ch.channel.requiredNedtK;
      if (sensitivity && req !== null && exceeds(sensitivity.nedtK, req)) {
        add(
          "nedt-unmet",
          i,
          `NEΔT of ${id} is ${fK(sensitivity.nedtK)} K, above the required ${fK(req)} K by ${fK(sensitivity.nedtK - req)} K (${Number((sensitivity.nedtK / req).toPrecision(3))}× the requirement${ch.channel.gainStability === 0 ? `; the integration time would have to grow about ${Number(((sensitivity.nedtK / req) ** 2).toPrecision(3))}× to meet it` : ""}).`,
          { nedtK: sensitivity.nedtK, requiredNedtK: req },
        );
      }
      const prot = ch.passbands.map((p) => ({ p, band: protectedBandHolding(p) })).find((x) => x.band !== null);
      if (prot && prot.band) {
        add(
          "in-protected-band",
          i,
          `Passband ${fBand(prot.p)} of ${id} lies inside ${fBand(prot.band.bandGHz)}, where the Radio Regulations (No. 5.340) prohibit all emissions${prot.band.fromMemory ? " (band edges from memory, to be checked against the current edition)" : ""}; the receiver itself does not transmit, but keep LO light out of the resonator so nothing is re-radiated there.`,
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

  // ---- order: chain-level first, then per channel in input order, codes in rules-table order (stable within a code)
  const byRule = (a: Finding, b: Finding) => ruleRank(a.code) - ruleRank(b.code);
  const findings = [...chainFindings.sort(byRule)];
  for (const list of perChannel) findings.push(...list.sort(byRule));
  return { L, channels, findings, spurs };
}
