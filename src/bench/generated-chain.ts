import type { PlanInput } from "@/schemas/plan";

/** An operating envelope for the generated chain: LO drift, resonator temperature excursion and FSR shift. */
export interface GeneratedEnvelope {
  driftMHz: number;
  temperatureExcursionK: number;
  fsrShiftMHzPerK: number;
}

/**
 * A 64-channel upper-sideband chain cut from one broad mode at 183.31 GHz
 * (invented demo data): 20 MHz channels every 60 MHz, an antenna box that
 * keeps the image out above L ≈ 185.9 GHz, a 40 GS/s digitised IF. With
 * `envelope`, a version 2 document with that drift, temperature excursion
 * and FSR shift (else ±5 MHz of drift, version 1).
 */
export function generatedChainPlan(envelope?: GeneratedEnvelope): PlanInput {
  const channels = Array.from({ length: 64 }, (_, k) => ({
    id: `c${k + 1}`,
    name: `demo channel ${k + 1}`,
    chain: "G",
    centerGHz: Math.round((181.4 + k * 0.06) * 1000) / 1000,
    bandwidthMHz: 20,
    dsbOffsetGHz: null,
    integrationMs: 10,
    antennaK: 250,
    receiverK: 4000,
    gainStability: 0,
    requiredNedtK: null,
  }));
  return {
    format: envelope ? "heterolane.plan/2" : "heterolane.plan/1",
    name: "Demo data: generated 64-channel chain for the benchmark",
    settings: { guardMHz: 20, imageRejectionDB: 20, spurMaxOrder: 7, replicaLimitDB: -20 },
    lasers: [
      {
        id: "LG",
        carrierTHz: 193.4,
        carrierPowerMW: 5,
        loPowerMW: 5,
        reach: [{ minGHz: 40, maxGHz: 340 }],
        stepMHz: 1,
        driftMHz: envelope?.driftMHz ?? 5,
        lock: { modulationMHz: 80, modulationIndex: 0.6, orders: 3 },
      },
    ],
    resonators: [
      { id: "RG", fsrGHz: 183.31, loadedQ: 5e4, ...(envelope ? { fsrShiftMHzPerK: envelope.fsrShiftMHzPerK } : {}) },
    ],
    detectors: [{ id: "DG", minGHz: 0.1, maxGHz: 19.5, maxInputMW: 10, sampleRateGHz: 40 }],
    chains: [
      {
        id: "G",
        laser: "LG",
        resonator: "RG",
        detector: "DG",
        mode: 1,
        sideband: "upper",
        loOffsetGHz: 187,
        rfInput: { minGHz: 180.5, maxGHz: 186.5 },
        tapFraction: 0.01,
        pathLossDB: 3,
        carrierRejectionDB: 0,
        sharedIf: false,
        ...(envelope ? { temperatureExcursionK: envelope.temperatureExcursionK } : {}),
      },
    ],
    channels,
  };
}
