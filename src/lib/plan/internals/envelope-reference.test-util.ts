import type { Plan } from "@/schemas/plan";
import { combResponse } from "./comb";
import { integratePiecewise } from "./numeric-reference.test-util";

/**
 * A deliberately simple, independent implementation of a channel's figures
 * over the operating envelope (docs/plan-format.md §12), for the tests: it
 * reads the plan's fields itself, builds every integrand pointwise from its
 * definition (the received band in the IF domain, the comb pointwise),
 * integrates by adaptive Simpson (Lyness 1969) and finds
 * each worst value on a dense grid over the box, refined once by a finer
 * grid around the best point. No closed form, no search of the engine's.
 */

export interface ReferenceFigures {
  nedtK: number;
  bandwidthMHz: number | null;
  /** Image rejection (dB), +∞ when nothing of the image gets in; null for DSB. */
  imageDB: number | null;
  modeResponse: number;
  centreErrorMHz: number;
}

interface Setup {
  s: 1 | -1;
  c: number;
  delta: number;
  fsr: number;
  phi: number;
  nStar: number;
  D: number;
  bands: [number, number][];
  centres: number[];
  w: number;
  rf: [number, number];
  Ta: number;
  Tr: number;
  g: number;
  tau: number;
  dsb: boolean;
}

function setup(plan: Plan, channelId: string): Setup {
  const ch = plan.channels.find((x) => x.id === channelId)!;
  const chain = plan.chains.find((x) => x.id === ch.chain)!;
  const laser = plan.lasers.find((x) => x.id === chain.laser)!;
  const res = plan.resonators.find((x) => x.id === chain.resonator)!;
  const s = chain.sideband === "upper" ? 1 : -1;
  const B = ch.bandwidthMHz / 1000;
  const rfCentres =
    ch.dsbOffsetGHz === null ? [ch.centerGHz] : [ch.centerGHz - ch.dsbOffsetGHz, ch.centerGHz + ch.dsbOffsetGHz];
  const bands = rfCentres
    .map((f) => {
      const a = s * (f - B / 2);
      const b = s * (f + B / 2);
      return [Math.min(a, b), Math.max(a, b)] as [number, number];
    })
    .sort((p, q) => p[0] - q[0]);
  const D = laser.driftMHz / 1000;
  return {
    s,
    c: s * chain.mode * res.fsrGHz,
    delta: (laser.carrierTHz * 1000) / res.loadedQ,
    fsr: res.fsrGHz,
    phi: res.fsrShiftMHzPerK / 1000,
    nStar: s * chain.mode,
    D,
    bands,
    centres: rfCentres,
    w: ch.ifFilter === "occupied" ? D : 0,
    rf: [chain.rfInput.minGHz, chain.rfInput.maxGHz],
    Ta: ch.antennaK,
    Tr: ch.receiverK,
    g: ch.gainStability,
    tau: ch.integrationMs / 1000,
    dsb: ch.dsbOffsetGHz !== null,
  };
}

const M = (x: number, m: number, delta: number) => 1 / (1 + ((2 * (x - m)) / delta) ** 2);

/** Every figure of the channel at one point (u, t) of the box, LO at L, from the definitions. */
export function figuresAt(plan: Plan, channelId: string, L: number, u: number, t: number): ReferenceFigures {
  const p = setup(plan, channelId);
  const m = p.c + p.nStar * p.phi * t; // the wanted mode moves with the FSR
  const lo = L + u;
  const recv = p.bands.map(([a, b]) => [a - p.w + u, b + p.w + u] as [number, number]);
  // IF images of the received bands about the moved LO (the nominal ones, widened for the occupied filter)
  const images = recv.map(([a, b]) => (lo <= a ? [a - lo, b - lo] : [lo - b, lo - a]) as [number, number]);
  const W = (y: number) => {
    let v = 0;
    for (const [a, b] of recv) {
      for (const x of [lo + y, lo - y]) if (x >= a && x <= b) v += M(x, m, p.delta);
    }
    return v;
  };
  // integrate over the union of the images, split at the images of the mode
  const pieces = images.map((iv) => [...iv] as [number, number]).sort((x, y) => x[0] - y[0]);
  const union: [number, number][] = [];
  for (const iv of pieces) {
    const last = union[union.length - 1];
    if (last && iv[0] <= last[1]) last[1] = Math.max(last[1], iv[1]);
    else union.push(iv);
  }
  const cuts = [Math.abs(m - lo)];
  const integ = (f: (y: number) => number) =>
    union.reduce((acc, [a, b]) => acc + integratePiecewise(f, a, b, cuts, 1e-12), 0);
  const Hz = 1e9;
  const intW = integ(W) * Hz;
  const intS = integ((y) => p.Ta * W(y) + p.Tr) * Hz;
  const intS2 = integ((y) => (p.Ta * W(y) + p.Tr) ** 2) * Hz;
  const nedtK = Math.sqrt(intS2 / p.tau + p.g * p.g * intS * intS) / intW;
  const bandwidthMHz = intS2 > 0 ? (intS * intS) / intS2 / 1e6 : null;

  // image: 2·(L + u) minus the received band, against the comb at fsr + φ·t (a plain sum of Lorentzians)
  let imageDB: number | null = null;
  if (!p.dsb) {
    const [a, b] = recv[0]!;
    const ia = 2 * lo - b;
    const ib = 2 * lo - a;
    const F = p.fsr + p.phi * t;
    // the comb pointwise: its exact sum over every mode (the closed form of comb.ts, itself checked against
    // brute-force sums in comb.test.ts); only its integral is left to Simpson
    const comb = (x: number) => combResponse(x, { fsr: F, delta: p.delta });
    let wi = 0;
    for (const [e1, e2] of [
      [p.rf[0], p.rf[1]],
      [-p.rf[1], -p.rf[0]],
    ] as const) {
      const x1 = Math.max(ia, e1);
      const x2 = Math.min(ib, e2);
      if (x2 > x1) {
        const nLo = Math.ceil(x1 / F);
        const nHi = Math.floor(x2 / F);
        const modeCuts: number[] = [];
        for (let n = nLo; n <= nHi && n - nLo < 50; n++) modeCuts.push(n * F);
        wi += integratePiecewise(comb, x1, x2, modeCuts, 1e-12);
      }
    }
    const wanted = integratePiecewise((x) => M(x, m, p.delta), a, b, [m], 1e-12);
    imageDB = wi > 0 ? 10 * Math.log10(wanted / wi) : Infinity;
  }

  // mode response at the received passband centres (slot: moved with u; occupied: not moved)
  let modeResponse = Infinity;
  for (const f of p.centres) {
    const x = p.s * f + (p.w > 0 ? 0 : u);
    modeResponse = Math.min(modeResponse, M(x, m, p.delta));
  }
  // effective centre: the centroid of the mode's response over each received band
  let centreErrorMHz = 0;
  for (let j = 0; j < p.bands.length; j++) {
    const [a, b] = recv[j]!;
    const m0 = integratePiecewise((x) => M(x, m, p.delta), a, b, [m], 1e-12);
    const m1 = integratePiecewise((x) => x * M(x, m, p.delta), a, b, [m], 1e-12);
    const nominal = p.s * ((p.bands[j]![0] + p.bands[j]![1]) / 2);
    centreErrorMHz = Math.max(centreErrorMHz, Math.abs(p.s * (m1 / m0) - nominal) * 1000);
  }
  return { nedtK, bandwidthMHz, imageDB, modeResponse, centreErrorMHz };
}

export interface ReferenceWorst {
  nedtK: number;
  bandwidthMHz: number | null;
  imageDB: number | null;
  modeResponse: number;
  centreErrorMHz: number;
}

/**
 * The worst of each figure over u ∈ [−D, D], t ∈ [tLo, tHi]: on an
 * `nu × nt` grid, then on a grid ten times finer over the two cells around
 * the best grid point of each figure.
 */
export function worstByGrid(
  plan: Plan,
  channelId: string,
  L: number,
  tLo: number,
  tHi: number,
  nu = 201,
  nt = 21,
): ReferenceWorst {
  const { D } = setup(plan, channelId);
  const us = (a: number, b: number, n: number) =>
    n <= 1 || b === a ? [a] : Array.from({ length: n }, (_, i) => a + ((b - a) * i) / (n - 1));
  type Key = keyof ReferenceFigures;
  const sign: Record<Key, 1 | -1> = { nedtK: 1, bandwidthMHz: -1, imageDB: -1, modeResponse: -1, centreErrorMHz: 1 };
  const best: Partial<Record<Key, { v: number; u: number; t: number }>> = {};
  const consider = (u: number, t: number) => {
    const f = figuresAt(plan, channelId, L, u, t);
    for (const k of Object.keys(sign) as Key[]) {
      const v = f[k];
      if (v === null) continue;
      const cur = best[k];
      if (cur === undefined || sign[k] * v > sign[k] * cur.v) best[k] = { v, u, t };
    }
  };
  const uGrid = us(-D, D, D === 0 ? 1 : nu);
  const tGrid = us(tLo, tHi, tLo === tHi ? 1 : nt);
  for (const u of uGrid) for (const t of tGrid) consider(u, t);
  const du = uGrid.length > 1 ? (2 * D) / (uGrid.length - 1) : 0;
  const dt = tGrid.length > 1 ? (tHi - tLo) / (tGrid.length - 1) : 0;
  const coarse = { ...best };
  for (const k of Object.keys(coarse) as Key[]) {
    const b = coarse[k]!;
    const fu = us(Math.max(-D, b.u - du), Math.min(D, b.u + du), du > 0 ? 21 : 1);
    const ft = us(Math.max(tLo, b.t - dt), Math.min(tHi, b.t + dt), dt > 0 ? 11 : 1);
    for (const u of fu) for (const t of ft) consider(u, t);
  }
  return {
    nedtK: best.nedtK?.v ?? NaN,
    bandwidthMHz: best.bandwidthMHz?.v ?? null,
    imageDB: best.imageDB?.v ?? null,
    modeResponse: best.modeResponse?.v ?? NaN,
    centreErrorMHz: best.centreErrorMHz?.v ?? NaN,
  };
}
