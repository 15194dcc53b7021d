import type { PlanInput } from "@/schemas/plan";

/**
 * The invented demo mission (demo data, every number made up): a 12U
 * small-satellite humidity and temperature sounder with four receiver chains,
 * beside the 118.75 GHz oxygen line, the 183.31 GHz water-vapour line, a
 * window near 243 GHz and the 325.15 GHz water-vapour line; three channels
 * per chain. Line frequencies are the usual rounded values of those lines
 * (common practice in microwave sounding); nothing else here describes a
 * real instrument.
 *
 * The plan is deliberately left with a few open findings for the demo: the
 * 118 GHz chain runs without a carrier notch (carrier-dominates-lo), its
 * core channel asks for a sensitivity it cannot reach (nedt-unmet), and the
 * 325 GHz chain places its LO so that one channel's image lands inside the
 * RF input (image-response).
 *
 * It is a version 2 plan and tells the operating-envelope story
 * (docs/plan-format.md §12): every resonator's FSR moves with temperature
 * (invented figures of the order issue 11 gives for lithium niobate,
 * −6.28 MHz/K at 183.31 GHz, scaled with the FSR) and every chain's
 * temperature control is ±0.5 K, except:
 *
 * - the 183 GHz chain's laser pair drifts by ±100 MHz; its wing channels sit
 *   600 MHz either side of the 645 MHz half-linewidth mode, so with IF
 *   filters on their nominal slots the drift carries them past half power
 *   (mode-detuned, nedt-unmet). Its filters pass the occupied band
 *   (`ifFilter: "occupied"`), and with them the chain passes;
 * - the 243 GHz window chain is only passively controlled to ±10 K, but its
 *   outer channels meet their NEΔT only within about ±8 K: its temperature
 *   window is too narrow for its temperature control (nedt-unmet on win-1
 *   and win-3, negative margin).
 */
export const DEMO_MISSION_NAME = "Demo: Aurora 12U sounder (invented)";
export const DEMO_MISSION_DESCRIPTION =
  "Demo data, invented: a 12U humidity and temperature sounder with chains at 118.75 GHz (O2), 183.31 GHz (H2O), a 243 GHz window and 325.15 GHz (H2O). Not a real instrument.";

const lock = { modulationMHz: 1500, modulationIndex: 0.2, orders: 1 };

export function demoPlan(): PlanInput {
  return {
    // version 2 for the noise-budget inputs of WGM-183 and H2O-183 (docs/plan-format.md §14)
    format: "heterolane.plan/2",
    name: DEMO_MISSION_NAME,
    settings: { guardMHz: 50, imageRejectionDB: 25, spurMaxOrder: 5, replicaLimitDB: -20 },
    lasers: [
      {
        id: "LP-118",
        carrierTHz: 193.4,
        carrierPowerMW: 10,
        loPowerMW: 2,
        reach: [{ minGHz: 110, maxGHz: 130 }],
        stepMHz: 10,
        driftMHz: 20,
        lock,
      },
      {
        id: "LP-183",
        carrierTHz: 193.4,
        carrierPowerMW: 10,
        loPowerMW: 3,
        reach: [{ minGHz: 175, maxGHz: 195 }],
        stepMHz: 10,
        driftMHz: 100,
        lock,
      },
      {
        id: "LP-243",
        carrierTHz: 193.4,
        carrierPowerMW: 12,
        loPowerMW: 3,
        reach: [{ minGHz: 235, maxGHz: 252 }],
        stepMHz: 10,
        driftMHz: 20,
        lock,
      },
      {
        id: "LP-325",
        carrierTHz: 193.4,
        carrierPowerMW: 12,
        loPowerMW: 3,
        reach: [
          { minGHz: 315, maxGHz: 322.5 },
          { minGHz: 323, maxGHz: 335 },
        ],
        stepMHz: 10,
        driftMHz: 25,
        lock,
      },
    ],
    resonators: [
      { id: "WGM-118", fsrGHz: 118.75, loadedQ: 150000, fsrShiftMHzPerK: -4.07 },
      // an invented measured conversion efficiency, so the 183 GHz channels show their noise budget
      { id: "WGM-183", fsrGHz: 183.31, loadedQ: 150000, fsrShiftMHzPerK: -6.28, conversionEfficiency: 0.01 },
      { id: "WGM-243", fsrGHz: 243.2, loadedQ: 150000, fsrShiftMHzPerK: -8.33 },
      { id: "WGM-325", fsrGHz: 325.15, loadedQ: 150000, fsrShiftMHzPerK: -11.14 },
    ],
    detectors: [
      { id: "BPD-A", minGHz: 0.05, maxGHz: 6, maxInputMW: 5, sampleRateGHz: null },
      { id: "BPD-B", minGHz: 0.05, maxGHz: 8, maxInputMW: 6, sampleRateGHz: null },
    ],
    chains: [
      {
        id: "O2-118",
        laser: "LP-118",
        resonator: "WGM-118",
        detector: "BPD-A",
        mode: 1,
        sideband: "upper",
        loOffsetGHz: 120.95,
        rfInput: { minGHz: 117.75, maxGHz: 119.75 },
        tapFraction: 0.01,
        pathLossDB: 3,
        carrierRejectionDB: 0,
        sharedIf: false,
        temperatureExcursionK: 0.5,
      },
      {
        id: "H2O-183",
        laser: "LP-183",
        resonator: "WGM-183",
        detector: "BPD-A",
        mode: 1,
        sideband: "upper",
        loOffsetGHz: 186.01,
        rfInput: { minGHz: 182.31, maxGHz: 184.31 },
        tapFraction: 0.01,
        pathLossDB: 3,
        carrierRejectionDB: 10,
        sharedIf: false,
        temperatureExcursionK: 0.5,
        frontEndLossDB: 0.5,
        frontEndTemperatureK: 290,
      },
      {
        id: "WIN-243",
        laser: "LP-243",
        resonator: "WGM-243",
        detector: "BPD-B",
        mode: 1,
        sideband: "upper",
        loOffsetGHz: 245.4,
        rfInput: { minGHz: 242.2, maxGHz: 244.2 },
        tapFraction: 0.01,
        pathLossDB: 3,
        carrierRejectionDB: 10,
        sharedIf: false,
        temperatureExcursionK: 10,
      },
      {
        id: "H2O-325",
        laser: "LP-325",
        resonator: "WGM-325",
        detector: "BPD-B",
        mode: 1,
        sideband: "upper",
        loOffsetGHz: 327.35,
        rfInput: { minGHz: 324.15, maxGHz: 329.35 },
        tapFraction: 0.01,
        pathLossDB: 3,
        carrierRejectionDB: 10,
        sharedIf: false,
        temperatureExcursionK: 0.5,
      },
    ],
    channels: [
      ch("o2-core", "118.75 O2 line centre", "O2-118", 118.75, 200, 1.5),
      ch("o2-w1", "118.75 O2 inner wing", "O2-118", 118.35, 200, 3.5),
      ch("o2-w2", "118.75 O2 outer wing", "O2-118", 119.15, 200, 3.5),
      // IF filters on the occupied band: the ±100 MHz drift moves the IF inside the filter, not the RF band.
      { ...ch("wv-core", "183.31 H2O line centre", "H2O-183", 183.31, 200, 3.5), ifFilter: "occupied" as const },
      { ...ch("wv-w1", "183.31 H2O wing −", "H2O-183", 182.71, 200, 4.5), ifFilter: "occupied" as const },
      { ...ch("wv-w2", "183.31 H2O wing +", "H2O-183", 183.91, 200, 4.5), ifFilter: "occupied" as const },
      ch("win-1", "243 window low", "WIN-243", 242.8, 200, 3.5),
      ch("win-2", "243 window mid", "WIN-243", 243.2, 200, 3.5),
      ch("win-3", "243 window high", "WIN-243", 243.6, 200, 3.5),
      ch("h325-core", "325.15 H2O line centre", "H2O-325", 325.15, 200, 3.5),
      ch("h325-w1", "325.15 H2O wing −", "H2O-325", 324.65, 200, 4),
      ch("h325-w2", "325.15 H2O wing +", "H2O-325", 325.65, 200, 4),
    ],
  };
}

function ch(id: string, name: string, chain: string, centerGHz: number, bandwidthMHz: number, requiredNedtK: number) {
  return {
    id,
    name,
    chain,
    centerGHz,
    bandwidthMHz,
    dsbOffsetGHz: null,
    integrationMs: 10,
    antennaK: 250,
    receiverK: 3000,
    gainStability: 0,
    requiredNedtK,
  };
}
