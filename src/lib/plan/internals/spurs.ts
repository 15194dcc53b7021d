import type { SpurFamily } from "../types";
import type { ChainContext } from "./chain-context";
import { type Interval, absInterval, compareIntervals, intersect, widen } from "./intervals";
import type { SlotGeometry } from "./slot";
import { type WorkCounter, countSteps } from "./work-counter";

/**
 * One spur band of a chain at a given L (docs/plan-format.md §5.2 "Building a spur band"):
 * already widened for drift, folded to `|·|` and intersected with the
 * detector band.
 */
export interface SpurBand {
  family: SpurFamily;
  order: number;
  band: Interval;
  source: string;
}

/**
 * Enumeration limit for the lock families: orders above this are not
 * listed (the schema accepts any integer `orders`; physically only the
 * first few carry power). See docs/decisions/017-plan-contract-readings.md.
 */
export const MAX_LOCK_ORDER_ENUMERATED = 10_000;

function keep(
  family: SpurFamily,
  order: number,
  raw: Interval,
  detector: Interval,
  source: string,
  out: SpurBand[],
): void {
  const band = intersect(absInterval(raw), detector);
  if (band) out.push({ family, order, band, source });
}

/**
 * `keep` for a raw band `[lo, hi]` given as numbers: pushes the kept band
 * with an empty source and returns it (the caller names it), so the source
 * text is only built for kept bands; null when nothing is kept.
 */
function keepRaw(
  family: SpurFamily,
  order: number,
  lo: number,
  hi: number,
  det: Interval,
  out: SpurBand[],
): SpurBand | null {
  // |[lo, hi]|
  let alo: number;
  let ahi: number;
  if (lo >= 0) {
    alo = lo;
    ahi = hi;
  } else if (hi <= 0) {
    alo = -hi;
    ahi = -lo;
  } else {
    alo = 0;
    ahi = Math.max(-lo, hi);
  }
  const blo = Math.max(alo, det[0]);
  const bhi = Math.min(ahi, det[1]);
  if (!(blo <= bhi)) return null;
  const band: SpurBand = { family, order, band: [blo, bhi], source: "" };
  out.push(band);
  return band;
}

function byBand(a: SpurBand, b: SpurBand): number {
  return compareIntervals(a.band, b.band);
}

/**
 * The spur families that can make errors: `carrier-beat`, `lock-lo`,
 * `lock-self`, each sorted by band. Lock orders whose band cannot reach the
 * detector band are skipped without changing the result. Each lock order
 * enumerated is one work step.
 */
export function errorSpursAt(ctx: ChainContext, L: number, work?: WorkCounter): SpurBand[] {
  const { D, fm, detectorBand: det } = ctx;
  const M = Math.min(ctx.lockOrders, MAX_LOCK_ORDER_ENUMERATED);
  const carrier: SpurBand[] = [];
  keep("carrier-beat", 1, widen([L, L], D), det, "L", carrier);

  const lockLo: SpurBand[] = [];
  const reachIF = det[1] + D;
  for (const sign of [-1, 1] as const) {
    // |L + sign·m·fm| ≤ det.hi + D  ⇒  m in [(−sign·L − reachIF)/fm, (−sign·L + reachIF)/fm]
    const centre = -sign * L;
    const mLo = Math.max(1, Math.ceil((centre - reachIF) / fm));
    const mHi = Math.min(M, Math.floor((centre + reachIF) / fm));
    countSteps(work, mHi - mLo + 1);
    for (let m = mLo; m <= mHi; m++) {
      const f = L + sign * m * fm;
      keep("lock-lo", m + 1, widen([f, f], D), det, `L${sign < 0 ? "−" : "+"}${m}·fm`, lockLo);
    }
  }
  lockLo.sort(byBand);

  const lockSelf: SpurBand[] = [];
  const mSelf = Math.min(2 * M, Math.floor(det[1] / fm));
  countSteps(work, mSelf);
  for (let m = 1; m <= mSelf; m++) keep("lock-self", m, [m * fm, m * fm], det, `${m}·fm`, lockSelf);
  lockSelf.sort(byBand);
  return [...carrier, ...lockLo, ...lockSelf];
}

/**
 * The harmonic and intermodulation families of the slots (channels with no
 * slot are left out), each sorted by band. `slots[i]` belongs to
 * `ctx.channels[i]`.
 */
export function infoSpurs(ctx: ChainContext, slots: readonly (SlotGeometry | null)[]): SpurBand[] {
  const N = ctx.plan.settings.spurMaxOrder;
  const { D, detectorBand: det } = ctx;
  const present: { id: string; slot: Interval }[] = [];
  ctx.channels.forEach((ch, i) => {
    const g = slots[i];
    if (g) present.push({ id: ch.channel.id, slot: g.slot });
  });
  const harmonic: SpurBand[] = [];
  for (const p of present) {
    for (let n = 2; n <= N; n++) {
      const kept = keepRaw("harmonic", n, n * p.slot[0] - n * D, n * p.slot[1] + n * D, det, harmonic);
      if (kept) kept.source = `${n}·${p.id}`;
    }
  }
  harmonic.sort(byBand);
  const intermod: SpurBand[] = [];
  for (let i = 0; i < present.length; i++) {
    for (let j = i + 1; j < present.length; j++) {
      const pi = present[i] as (typeof present)[number];
      const pj = present[j] as (typeof present)[number];
      const [li, hi] = pi.slot;
      const [lj, hj] = pj.slot;
      for (let a = 1; a < N; a++) {
        for (let b = 1; a + b <= N; b++) {
          const w = (a + b) * D;
          // a·[li,hi] + b·[lj,hj] and a·[li,hi] − b·[lj,hj] (docs/plan-format.md §5.5 "Interval arithmetic"), widened by (a+b)·D
          const sum = keepRaw("intermod", a + b, a * li + b * lj - w, a * hi + b * hj + w, det, intermod);
          if (sum) sum.source = `${a}·${pi.id}+${b}·${pj.id}`;
          const diff = keepRaw("intermod", a + b, a * li - b * hj - w, a * hi - b * lj + w, det, intermod);
          if (diff) diff.source = `${a}·${pi.id}−${b}·${pj.id}`;
        }
      }
    }
  }
  intermod.sort(byBand);
  return [...harmonic, ...intermod];
}
