import type { PlanChannel, PlanDetector, PlanLaser, PlanResonator, PlanChain } from "@/schemas/plan";
import type { NoiseBudget, NoiseTerm, NoiseTermEntry } from "../types";

/**
 * The receiver noise budget (docs/plan-format.md §14 and the derivation in
 * docs/calculations.md "Receiver noise budget"; readings in
 * docs/decisions/025-noise-budget.md). Everything here is independent of
 * the LO offset L: per chain the hardware's efficiencies and the ratios of
 * each detector-side noise to the LO's shot noise, per channel the terms
 * in kelvin referred to the antenna.
 */

/** Exact SI constants (BIPM SI Brochure, 9th ed., 2019). */
export const PLANCK_J_S = 6.626_070_15e-34;
export const BOLTZMANN_J_PER_K = 1.380_649e-23;
export const ELEMENTARY_CHARGE_C = 1.602_176_634e-19;

const dbToLinear = (db: number) => 10 ** (db / 10);

/**
 * Through-port power transmission of an all-pass resonator at resonance,
 * `T = ((κ₀ − κ_ex)/κ)² = (2·Q_L/Q₀ − 1)²` (Gorodetsky & Ilchenko, JOSA B 16, 147 (1999)),
 * with `κ₀/κ = Q_L/Q₀` and `κ_ex = κ − κ₀`.
 */
export function throughTransmission(loadedQ: number, intrinsicQ: number): number {
  const x = (2 * loadedQ) / intrinsicQ - 1;
  return x * x;
}

/** Coupling share of the optical mode `κ_ex/κ = 1 − Q_L/Q₀`. */
export function opticalCouplingRatio(loadedQ: number, intrinsicQ: number): number {
  return 1 - loadedQ / intrinsicQ;
}

/**
 * Intracavity photon number of a pump of power `pumpW` on resonance,
 * `n = 4·κ_ex·P/(ħω·κ²) = 4·(κ_ex/κ)·P·Q_L/(ħ·ω²)`, ω = 2π·ν
 * (Gorodetsky & Ilchenko 1999, the circulating energy at resonance).
 */
export function pumpPhotons(pumpW: number, carrierHz: number, loadedQ: number, intrinsicQ: number): number {
  const omega = 2 * Math.PI * carrierHz;
  const hbar = PLANCK_J_S / (2 * Math.PI);
  return (4 * opticalCouplingRatio(loadedQ, intrinsicQ) * pumpW * loadedQ) / (hbar * omega * omega);
}

/**
 * Photon conversion efficiency of the triply resonant converter on
 * resonance, `η = (κ_ex/κ)_opt·(κ_ex/κ)_mm·4C/(1 + C)²`, cooperativity
 * `C = 4·g₀²·n_p/(κ_o·κ_m)` (Tsang, Phys. Rev. A 81, 063837 (2010);
 * Ilchenko et al., JOSA B 20, 333 (2003); Strekalov et al., Opt. Lett. 34,
 * 713 (2009)); rates in Hz (g₀/2π, κ/2π = frequency/Q), which leaves C unchanged.
 */
export function computedEta(p: {
  g0Hz: number;
  pumpPhotons: number;
  carrierHz: number;
  loadedQ: number;
  intrinsicQ: number;
  mmWaveHz: number;
  mmWaveQ: number;
  mmWaveCouplingRatio: number;
}): number {
  const kappaO = p.carrierHz / p.loadedQ;
  const kappaM = p.mmWaveHz / p.mmWaveQ;
  const C = (4 * p.g0Hz * p.g0Hz * p.pumpPhotons) / (kappaO * kappaM);
  return (opticalCouplingRatio(p.loadedQ, p.intrinsicQ) * p.mmWaveCouplingRatio * 4 * C) / ((1 + C) * (1 + C));
}

/**
 * A chain's noise figures that do not depend on the channel: efficiencies,
 * powers, and each detector-side noise as a multiple of the LO's shot noise.
 */
export interface ChainNoise {
  /** Photon conversion efficiency η and where it came from. */
  eta: number;
  etaSource: "entered" | "computed";
  /** Optical path efficiency from the resonator to the detector, `(1 − tapFraction)·10^(−pathLossDB/10)`. */
  etaPath: number;
  /** Quantum efficiency of the photodiodes (1 when not given). */
  etaQE: number;
  /** Front-end loss as a power ratio L_fe ≥ 1 and its physical temperature (K). */
  lossLinear: number;
  frontEndK: number;
  /** Carrier and LO power at the detector (mW). */
  carrierMW: number;
  loMW: number;
  /**
   * Each detector-side noise as a multiple of the LO's shot noise `2q·R·P_LO`,
   * so that its kelvin is that multiple of the quantum term `T_Q`.
   */
  ratios: Record<Exclude<NoiseTerm, "front-end-loss" | "quantum-limit" | "conversion-loss">, number>;
  /** `b` and `c` of `T_rec(P_LO) = a + T_Q·(b'/P_LO + c'·P_LO)` in mW and 1/mW (see `optimalLoMW`). */
  loInverse: number;
  loLinear: number;
}

/** The hardware a chain's budget reads. */
export interface NoiseHardware {
  laser: PlanLaser;
  resonator: PlanResonator;
  detector: PlanDetector;
  chain: PlanChain;
  /** Frequency of the wanted mm-wave mode (GHz, > 0). */
  modeGHz: number;
  /** Carrier and LO power at the detector (mW). */
  carrierMW: number;
  loMW: number;
}

/** The photon conversion efficiency the resonator gives, or null when it gives none. */
export function chainEta(h: NoiseHardware): { eta: number; source: "entered" | "computed" } | null {
  const r = h.resonator;
  if (r.conversionEfficiency !== null) return { eta: r.conversionEfficiency, source: "entered" };
  if (r.intrinsicQ === null || r.g0Hz === null || r.mmWaveQ === null || r.mmWaveCouplingRatio === null) return null;
  const carrierHz = h.laser.carrierTHz * 1e12;
  const eta = computedEta({
    g0Hz: r.g0Hz,
    pumpPhotons: pumpPhotons(h.laser.carrierPowerMW / 1000, carrierHz, r.loadedQ, r.intrinsicQ),
    carrierHz,
    loadedQ: r.loadedQ,
    intrinsicQ: r.intrinsicQ,
    mmWaveHz: h.modeGHz * 1e9,
    mmWaveQ: r.mmWaveQ,
    mmWaveCouplingRatio: r.mmWaveCouplingRatio,
  });
  return { eta, source: "computed" };
}

/** The chain's noise figures, or null when its resonator gives no conversion efficiency (no budget). */
export function chainNoise(h: NoiseHardware): ChainNoise | null {
  const e = chainEta(h);
  if (!e || !(e.eta > 0)) return null;
  const { laser, detector: d, chain } = h;
  const q = ELEMENTARY_CHARGE_C;
  const R = d.responsivityAPerW;
  const pc = h.carrierMW / 1000;
  const plo = h.loMW / 1000;
  const inSq = d.noiseCurrentPAPerRtHz === null ? 0 : (d.noiseCurrentPAPerRtHz * 1e-12) ** 2;
  const common = d.cmrrDB === null ? 1 : dbToLinear(-d.cmrrDB);
  const etaPath = (1 - chain.tapFraction) * dbToLinear(-chain.pathLossDB);
  // the carrier laser's broadband floor where the signal is, at the detector (W/Hz)
  const carrierFloorW =
    laser.carrierFloorDBcPerHz === null
      ? 0
      : (laser.carrierPowerMW / 1000) *
        dbToLinear(laser.carrierFloorDBcPerHz) *
        dbToLinear(-laser.carrierPreFilterDB) *
        etaPath;
  // the LO laser's floor where the residual carrier is, relative to the LO power (1/Hz)
  const loFloorRel =
    laser.loFloorDBcPerHz === null ? 0 : dbToLinear(laser.loFloorDBcPerHz) * dbToLinear(-laser.loPreFilterDB);
  const rinC = laser.carrierRinDBcPerHz === null ? 0 : dbToLinear(laser.carrierRinDBcPerHz);
  const rinL = laser.loRinDBcPerHz === null ? 0 : dbToLinear(laser.loRinDBcPerHz);
  const withR = (f: (r: number) => number) => (R === null ? 0 : f(R));
  const ratios = {
    "carrier-shot-noise": pc / plo,
    "detector-noise": withR((r) => inSq / (2 * q * r * plo)),
    "carrier-floor": withR((r) => (2 * r * carrierFloorW) / q),
    "lo-floor": withR((r) => (2 * r * pc * loFloorRel) / q),
    "carrier-rin": withR((r) => (r * pc * pc * rinC * common) / (2 * q * plo)),
    "lo-rin": withR((r) => (r * plo * rinL * common) / (2 * q)),
  };
  // T_rec(P) = a + T_Q·(1 + floor terms + b/P + c·P), P the LO power in mW
  const loInverse = h.carrierMW + withR((r) => (inSq / (2 * q * r) + (r * pc * pc * rinC * common) / (2 * q)) * 1000);
  const loLinear = withR((r) => (r * rinL * common) / (2 * q) / 1000);
  return {
    eta: e.eta,
    etaSource: e.source,
    etaPath,
    etaQE: quantumEfficiency(d, laser.carrierTHz),
    lossLinear: dbToLinear(chain.frontEndLossDB),
    frontEndK: chain.frontEndTemperatureK,
    carrierMW: h.carrierMW,
    loMW: h.loMW,
    ratios,
    loInverse,
    loLinear,
  };
}

/**
 * The quantum efficiency of the photodiodes: as entered; else from the
 * responsivity, `η_QE = R·h·ν/q` (at most 1); else 1 (an ideal detector).
 */
export function quantumEfficiency(d: PlanDetector, carrierTHz: number): number {
  if (d.quantumEfficiency !== null) return d.quantumEfficiency;
  if (d.responsivityAPerW === null) return 1;
  return Math.min(1, (d.responsivityAPerW * PLANCK_J_S * carrierTHz * 1e12) / ELEMENTARY_CHARGE_C);
}

/** `L_fe·h·f/(k·η·η_path·η_QE)`: the quantum and conversion term, of which every detector-side term is a multiple. */
export function quantumTermK(n: ChainNoise, rfGHz: number): number {
  return (n.lossLinear * quantumLimitK(rfGHz)) / (n.eta * n.etaPath * n.etaQE);
}

/** `h·f/k` (K) at `rfGHz`: the heterodyne quantum limit (Caves, Phys. Rev. D 26, 1817 (1982)). */
export function quantumLimitK(rfGHz: number): number {
  return (PLANCK_J_S * rfGHz * 1e9) / BOLTZMANN_J_PER_K;
}

/** The terms of a channel's budget in `NOISE_TERMS` order (K, referred to the antenna). */
export function budgetTerms(n: ChainNoise, rfGHz: number): NoiseTermEntry[] {
  const tq = quantumTermK(n, rfGHz);
  const limit = n.lossLinear * quantumLimitK(rfGHz);
  const terms: [NoiseTerm, number][] = [
    ["front-end-loss", (n.lossLinear - 1) * n.frontEndK],
    ["quantum-limit", limit],
    ["conversion-loss", Math.max(0, tq - limit)],
    ["carrier-shot-noise", tq * n.ratios["carrier-shot-noise"]],
    ["detector-noise", tq * n.ratios["detector-noise"]],
    ["carrier-floor", tq * n.ratios["carrier-floor"]],
    ["lo-floor", tq * n.ratios["lo-floor"]],
    ["carrier-rin", tq * n.ratios["carrier-rin"]],
    ["lo-rin", tq * n.ratios["lo-rin"]],
  ];
  return terms.map(([term, kelvin]) => ({ term, kelvin: kelvin + 0 }));
}

/** The `noiseBudget` of a channel (docs/plan-format.md §14.4). */
export function channelBudget(n: ChainNoise, channel: PlanChannel): NoiseBudget {
  const terms = budgetTerms(n, channel.centerGHz);
  let totalK = 0;
  for (const t of terms) totalK += t.kelvin;
  const computed = channel.receiverKSource === "computed";
  return {
    source: computed ? "computed" : "entered",
    totalK,
    terms,
    enteredK: computed ? null : channel.receiverK,
    ratio: computed ? null : channel.receiverK / totalK,
    conversionEfficiency: n.eta,
    conversionEfficiencySource: n.etaSource,
  };
}

/**
 * The LO power (mW) that minimises every channel's receiver temperature —
 * and so its NEΔT, which grows with it — without `pd-overload`:
 * `T_rec(P) = a + T_Q·(b/P + c·P)` with b, c ≥ 0 is smallest at
 * `P* = √(b/c)` (at the bound when c = 0), clamped to
 * `P ≤ 2·maxInputMW − P_c` (each photodiode gets (P_c + P)/2); null when
 * no LO power keeps the photodiodes within their limit.
 */
export function optimalLoMW(n: ChainNoise, maxInputMW: number): number | null {
  const upper = 2 * maxInputMW - n.carrierMW;
  if (!(upper > 0)) return null;
  if (!(n.loLinear > 0)) return upper;
  const best = Math.sqrt(n.loInverse / n.loLinear);
  return Math.min(best, upper);
}
