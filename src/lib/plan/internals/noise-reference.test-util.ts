import type { Plan } from "@/schemas/plan";

/**
 * An independent, simpler implementation of a channel's receiver noise
 * for the tests: instead of ratios to the LO's shot noise, it works out
 * the photocurrent spectral densities themselves (A²/Hz, one-sided) of
 * the signal that one kelvin at the antenna makes and of every noise, and
 * takes their quotient; the front end is a two-stage Friis cascade
 * `T = T₁ + T₂/G₁` (Pozar, Microwave Engineering, 4th ed., noise of
 * cascaded stages) with `T₁ = (L − 1)·T_phys`, `G₁ = 1/L`. It assumes a
 * responsivity consistent with the quantum efficiency, `R = η_QE·q/(h·ν)`.
 */

const h = 6.626_070_15e-34;
const kB = 1.380_649e-23;
const q = 1.602_176_634e-19;

export function referenceReceiverK(plan: Plan, chainId: string, channelId: string, eta: number): number {
  const chain = plan.chains.find((c) => c.id === chainId)!;
  const laser = plan.lasers.find((l) => l.id === chain.laser)!;
  const res = plan.resonators.find((r) => r.id === chain.resonator)!;
  const det = plan.detectors.find((d) => d.id === chain.detector)!;
  const ch = plan.channels.find((c) => c.id === channelId)!;
  const nu = laser.carrierTHz * 1e12;
  const f = ch.centerGHz * 1e9;
  const etaQE = det.quantumEfficiency ?? 1;
  const R = etaQE * (q / (h * nu));
  const path = (1 - chain.tapFraction) * Math.pow(10, -chain.pathLossDB / 10);
  const T =
    res.intrinsicQ === null
      ? 1
      : Math.pow((1 / res.intrinsicQ - (1 / res.loadedQ - 1 / res.intrinsicQ)) * res.loadedQ, 2);
  const pc = (laser.carrierPowerMW / 1000) * path * Math.pow(10, -chain.carrierRejectionDB / 10) * T;
  const plo = laser.loPowerMW / 1000;
  // one kelvin at the resonator's input: kB/(h f) photons per second per hertz, converted
  // one for one with efficiency η and carried to the detector: an optical density (W/Hz)
  const sigW = (kB / (h * f)) * eta * path * h * nu;
  // its beat with the LO, on one side of the LO: 2R²·P_LO·S (A²/Hz per K)
  const signalPerK = 2 * R * R * plo * sigW;
  const common = det.cmrrDB === null ? 1 : Math.pow(10, -det.cmrrDB / 10);
  const inSq = det.noiseCurrentPAPerRtHz === null ? 0 : Math.pow(det.noiseCurrentPAPerRtHz * 1e-12, 2);
  const db = (x: number | null) => (x === null ? 0 : Math.pow(10, x / 10));
  const floorC =
    (laser.carrierPowerMW / 1000) *
    db(laser.carrierFloorDBcPerHz) *
    Math.pow(10, -laser.carrierPreFilterDB / 10) *
    path *
    (laser.carrierFloorDBcPerHz === null ? 0 : 1);
  const floorL =
    plo *
    db(laser.loFloorDBcPerHz) *
    Math.pow(10, -laser.loPreFilterDB / 10) *
    (laser.loFloorDBcPerHz === null ? 0 : 1);
  const noise =
    2 * q * R * (plo + pc) + // shot noise of all the light (Abbas, Chan & Yee 1983: it stays after balancing)
    inSq + // the amplifier
    4 * R * R * plo * floorC + // the LO beating with the carrier's floor on both sides of it
    4 * R * R * pc * floorL + // the carrier beating with the LO's floor on both sides of it
    R * R * pc * pc * db(laser.carrierRinDBcPerHz) * common * (laser.carrierRinDBcPerHz === null ? 0 : 1) +
    R * R * plo * plo * db(laser.loRinDBcPerHz) * common * (laser.loRinDBcPerHz === null ? 0 : 1);
  const converter = noise / signalPerK;
  const L = Math.pow(10, chain.frontEndLossDB / 10);
  const T1 = (L - 1) * chain.frontEndTemperatureK;
  return T1 + converter / (1 / L);
}
