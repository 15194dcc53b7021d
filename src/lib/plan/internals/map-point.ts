import { CODE_BIT, type MapModel } from "./map-model";
import { isPointBox } from "./envelope-box";
import { combRadius, lowestWantedIntegral, makeComb, makeEnvelopeImageFires } from "./map-image";
import { MAX_LOCK_ORDER_ENUMERATED } from "./spurs";

/**
 * The L-dependent error codes of one chain at one LO offset, evaluated
 * directly from the rules (docs/plan-format.md §4.1 "The rules" and §5 "Spur families"),
 * as a code-set mask (`CODE_BIT`). This is the lean per-offset check: it
 * skips every rule that cannot produce an error (harmonic and intermod
 * spurs, warnings, L-independent rules) and stops looking for a code once
 * it has fired. The exact map never calls it; the grid reference of the
 * benchmark and the tests do.
 */

const TOL = 1e-9;

/** Image of `[lo, hi]` under the Nyquist fold into `[0, h]` (one interval). */
function foldInto(lo: number, hi: number, h: number, out: [number, number]): void {
  const fold = (f: number) => {
    const z = Math.floor(f / h);
    const r = f - z * h;
    return z % 2 === 0 ? r : h - r;
  };
  const a = fold(lo);
  const b = fold(hi);
  let l = Math.min(a, b);
  let u = Math.max(a, b);
  const kFirst = Math.floor(lo / h) + 1;
  const kLast = Math.ceil(hi / h) - 1;
  if (kLast - kFirst >= 1) {
    l = 0;
    u = h;
  } else if (kLast === kFirst) {
    if (kFirst % 2 === 0) l = 0;
    else u = h;
  }
  out[0] = l;
  out[1] = u;
}

const gapLess = (al: number, ah: number, bl: number, bh: number, g: number) =>
  Math.max(al, bl) - Math.min(ah, bh) < g - TOL;

/** Build the evaluator for one chain; the returned function maps L to a code mask. */
export function makePointEvaluator(m: MapModel): (L: number) => number {
  const comb = makeComb(m.linewidth, m.fsr);
  const n = m.channels.length;
  const h = m.halfFs;
  // per-call scratch (local to this evaluator, not module state)
  const has = new Uint8Array(n);
  const oLo = new Float64Array(n);
  const oHi = new Float64Array(n);
  const fLo = new Float64Array(n);
  const fHi = new Float64Array(n);
  const zone = new Float64Array(n); // −1: straddles (left out of alias-overlap)
  const tmp: [number, number] = [0, 0];
  // image rule: it cannot fire unless X' comes within r of a mode centre
  // (docs/plan-format.md §6.3 "The image rule": ∫Wᵢ ≤ B·max C over X'); over the
  // operating envelope X' moves by ±D and mode n by n·φ·t, and ∫W is its lowest (§12.5)
  const box = m.box;
  const moving = !isPointBox(box);
  const tMax = moving ? Math.max(Math.abs(box.tLo), Math.abs(box.tHi)) : 0;
  const phi = moving ? Math.abs(box.phi) : 0;
  const drift = moving ? box.D : 0;
  const widen = m.channels.map((ch) => (moving && ch.occupied ? box.D : 0));
  const imageRadius = m.channels.map((ch, i) => {
    if (!ch.ssb) return -1;
    const level =
      Math.pow(10, -m.imageRejectionDB / 10) * (lowestWantedIntegral(m, ch, box) / (ch.widthGHz + 2 * widen[i]!));
    const r = combRadius(comb, level);
    return moving && r >= 0 ? Math.min(m.fsr / 2, r * 1.01) : r;
  });
  const imageFiresAt = m.channels.map((ch) => makeEnvelopeImageFires(comb, m, ch, box));
  const imageCandidate = (i: number, L: number): boolean => {
    const r = imageRadius[i] as number;
    if (r < 0) return false;
    if (r >= m.fsr / 2) return true;
    const b = m.channels[i]!.bands[0]!;
    const w = widen[i]!;
    const lo = 2 * L - (w === 0 ? b[1] : b[1] + w) - drift;
    const hi = 2 * L - (w === 0 ? b[0] : b[0] - w) + drift;
    const n = Math.round((lo + hi) / 2 / m.fsr);
    for (let k = n - 1; k <= n + 1; k++) {
      const c = k * m.fsr;
      const move = Math.abs(k) * phi * tMax;
      if (lo <= c + r + move && hi >= c - r - move) return true;
    }
    return false;
  };
  // error spur families: carrier-beat, lock-lo (±m·fm), widened by D; lock-self fixed
  const movingOffsets: number[] = [0];
  // lock orders up to the engine's enumeration limit whose band can reach the detector
  // somewhere in the reach (|L ± k·fm| − D ≤ detMax)
  const M = Math.min(m.lockOrders, MAX_LOCK_ORDER_ENUMERATED);
  const reachIF = m.detMax + m.drift;
  const rLo = m.reach.length ? m.reach[0]![0] : 0;
  const rHi = m.reach.length ? m.reach[m.reach.length - 1]![1] : 0;
  for (const [sign, lo, hi] of [
    [-1, rLo - reachIF, rHi + reachIF],
    [1, -rHi - reachIF, -rLo + reachIF],
  ] as const) {
    const kLo = Math.max(1, Math.ceil(lo / m.fm));
    const kHi = Math.min(M, Math.floor(hi / m.fm));
    for (let k = kLo; k <= kHi; k++) movingOffsets.push(sign * k * m.fm);
  }
  const fixedTones: number[] = [];
  const kSelf = Math.min(2 * M, Math.floor(m.detMax / m.fm));
  for (let k = 1; k <= kSelf; k++) fixedTones.push(k * m.fm);
  const spurCount = movingOffsets.length + fixedTones.length;
  const sLo = new Float64Array(spurCount);
  const sHi = new Float64Array(spurCount);
  const sfLo = new Float64Array(spurCount);
  const sfHi = new Float64Array(spurCount);
  const D = m.drift;
  const g = m.guard;

  return (L: number): number => {
    let mask = 0;
    let covered = false;
    for (const r of m.reach) {
      if (L - D >= r[0] - TOL && L + D <= r[1] + TOL) {
        covered = true;
        break;
      }
    }
    if (!covered) mask |= CODE_BIT["lo-uncovered"];

    for (let i = 0; i < n; i++) {
      const ch = m.channels[i]!;
      let inBand = false;
      let lo = Infinity;
      let hi = -Infinity;
      for (const b of ch.bands) {
        if (L > b[0] && L < b[1]) {
          inBand = true;
          break;
        }
        const dl = L <= b[0] ? b[0] - L : L - b[1];
        const dh = L <= b[0] ? b[1] - L : L - b[0];
        if (dl < lo) lo = dl;
        if (dh > hi) hi = dh;
      }
      if (inBand) {
        has[i] = 0;
        mask |= CODE_BIT["lo-in-band"];
        continue;
      }
      has[i] = 1;
      lo -= D;
      hi += D;
      oLo[i] = lo;
      oHi[i] = hi;
      if (lo < m.detMin - TOL || hi > m.detMax + TOL) mask |= CODE_BIT["if-outside-detector"];
      if (ch.ssb && !(mask & CODE_BIT["image-response"]) && imageCandidate(i, L) && imageFiresAt[i]!(L)) {
        mask |= CODE_BIT["image-response"];
      }
      if (h !== null) {
        foldInto(lo, hi, h, tmp);
        fLo[i] = tmp[0];
        fHi[i] = tmp[1];
        const k = Math.max(1, Math.floor((lo + TOL) / h) + 1);
        if (k * h > lo + TOL && k * h < hi - TOL) {
          mask |= CODE_BIT["nyquist-straddle"];
          zone[i] = -1;
        } else zone[i] = Math.floor((lo + hi) / 2 / h);
      }
    }

    if (!m.sharedIf) {
      outer: for (let i = 0; i < n; i++) {
        if (!has[i]) continue;
        for (let j = i + 1; j < n; j++) {
          if (has[j] && gapLess(oLo[i]!, oHi[i]!, oLo[j]!, oHi[j]!, g)) {
            mask |= CODE_BIT["slot-overlap"];
            break outer;
          }
        }
      }
    }

    // spur bands at L: folded to |·|, intersected with the detector band
    let ns = 0;
    for (const c of movingOffsets) {
      let lo = L + c - D;
      let hi = L + c + D;
      if (lo < 0) {
        if (hi <= 0) {
          const t = lo;
          lo = -hi;
          hi = -t;
        } else {
          hi = Math.max(-lo, hi);
          lo = 0;
        }
      }
      lo = Math.max(lo, m.detMin);
      hi = Math.min(hi, m.detMax);
      if (lo > hi) continue;
      sLo[ns] = lo;
      sHi[ns] = hi;
      ns++;
    }
    for (const f of fixedTones) {
      if (f < m.detMin || f > m.detMax) continue;
      sLo[ns] = f;
      sHi[ns] = f;
      ns++;
    }
    if (h !== null) {
      for (let k = 0; k < ns; k++) {
        foldInto(sLo[k]!, sHi[k]!, h, tmp);
        sfLo[k] = tmp[0];
        sfHi[k] = tmp[1];
      }
    }
    spurs: for (let i = 0; i < n; i++) {
      if (!has[i]) continue;
      for (let k = 0; k < ns; k++) {
        if (
          gapLess(sLo[k]!, sHi[k]!, oLo[i]!, oHi[i]!, g) ||
          (h !== null && gapLess(sfLo[k]!, sfHi[k]!, fLo[i]!, fHi[i]!, g))
        ) {
          mask |= CODE_BIT["spur-in-slot"];
          break spurs;
        }
      }
    }

    if (h !== null) {
      alias: for (let i = 0; i < n; i++) {
        if (!has[i] || zone[i] === -1) continue;
        for (let j = i + 1; j < n; j++) {
          if (!has[j] || zone[j] === -1 || zone[j] === zone[i]) continue;
          if (gapLess(fLo[i]!, fHi[i]!, fLo[j]!, fHi[j]!, g)) {
            mask |= CODE_BIT["alias-overlap"];
            break alias;
          }
        }
      }
    }
    return mask;
  };
}
