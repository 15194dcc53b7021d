import type { PlanInput } from "@/schemas/plan";

/**
 * The second invented demo instrument (demo data, every number made up):
 * one dual-laser module, laser pair LP1, serving three receiver chains near
 * 180, 240 and 320 GHz by an observation schedule (docs/plan-format.md §13).
 * The same plan is docs/examples/shared-laser.plan.json under another name
 * (a unit test holds the two together). As written, the 180 GHz channel
 * gets too small a share of each cycle (nedt-unmet, shared-nedt-unmet); the
 * seed then applies the result's best split as the next revision, which
 * meets every requirement.
 */
export const SHARED_LASER_MISSION_NAME = "Demo: Tern shared-laser sounder (invented)";
export const SHARED_LASER_MISSION_DESCRIPTION =
  "Demo data, invented: one laser pair retuned between three receiver chains near 180, 240 and 320 GHz in a 200 ms observation schedule. Not a real instrument.";

export function sharedLaserDemoPlan(): PlanInput {
  return {
    format: "heterolane.plan/2",
    name: "Demo: Tern shared-laser sounder (invented)",
    settings: {
      guardMHz: 50,
      imageRejectionDB: 20,
      spurMaxOrder: 5,
      replicaLimitDB: -20,
    },
    lasers: [
      {
        id: "LP1",
        carrierTHz: 193.4,
        carrierPowerMW: 10,
        loPowerMW: 2,
        reach: [
          {
            minGHz: 170,
            maxGHz: 330,
          },
        ],
        stepMHz: 10,
        driftMHz: 2,
        lock: {
          modulationMHz: 100,
          modulationIndex: 0.5,
          orders: 2,
        },
        schedule: {
          cycleMs: 200,
          retuneMs: 2,
          retuneMsPerGHz: 0.01,
          relockMs: 5,
          dwells: [
            {
              chain: "A180",
              dwellMs: 50,
            },
            {
              chain: "B240",
              dwellMs: 60,
            },
            {
              chain: "C320",
              dwellMs: 90,
            },
          ],
        },
      },
    ],
    resonators: [
      {
        id: "R60",
        fsrGHz: 60,
        loadedQ: 5000000,
        fsrShiftMHzPerK: 0,
      },
      {
        id: "R80",
        fsrGHz: 80,
        loadedQ: 5000000,
        fsrShiftMHzPerK: 0,
      },
    ],
    detectors: [
      {
        id: "D1",
        minGHz: 0.05,
        maxGHz: 6,
        maxInputMW: 5,
        sampleRateGHz: null,
      },
    ],
    chains: [
      {
        id: "A180",
        laser: "LP1",
        resonator: "R60",
        detector: "D1",
        mode: 3,
        sideband: "upper",
        loOffsetGHz: 181.5,
        rfInput: {
          minGHz: 175,
          maxGHz: 186,
        },
        tapFraction: 0.01,
        pathLossDB: 3,
        carrierRejectionDB: 10,
        sharedIf: false,
        temperatureExcursionK: 0,
      },
      {
        id: "B240",
        laser: "LP1",
        resonator: "R60",
        detector: "D1",
        mode: 4,
        sideband: "upper",
        loOffsetGHz: 241.5,
        rfInput: {
          minGHz: 235,
          maxGHz: 246,
        },
        tapFraction: 0.01,
        pathLossDB: 3,
        carrierRejectionDB: 10,
        sharedIf: false,
        temperatureExcursionK: 0,
      },
      {
        id: "C320",
        laser: "LP1",
        resonator: "R80",
        detector: "D1",
        mode: 4,
        sideband: "upper",
        loOffsetGHz: 321.5,
        rfInput: {
          minGHz: 315,
          maxGHz: 326,
        },
        tapFraction: 0.01,
        pathLossDB: 3,
        carrierRejectionDB: 10,
        sharedIf: false,
        temperatureExcursionK: 0,
      },
    ],
    channels: [
      {
        id: "a1",
        name: "180 GHz core",
        chain: "A180",
        centerGHz: 180.0,
        bandwidthMHz: 20,
        dsbOffsetGHz: null,
        integrationMs: 100,
        antennaK: 250,
        receiverK: 4000,
        gainStability: 0,
        requiredNedtK: 6.0,
        ifFilter: "slot",
        centreToleranceMHz: null,
      },
      {
        id: "b1",
        name: "240 GHz core",
        chain: "B240",
        centerGHz: 240.0,
        bandwidthMHz: 20,
        dsbOffsetGHz: null,
        integrationMs: 100,
        antennaK: 250,
        receiverK: 4000,
        gainStability: 0,
        requiredNedtK: 6.5,
        ifFilter: "slot",
        centreToleranceMHz: null,
      },
      {
        id: "c1",
        name: "320 GHz core",
        chain: "C320",
        centerGHz: 320.0,
        bandwidthMHz: 20,
        dsbOffsetGHz: null,
        integrationMs: 100,
        antennaK: 250,
        receiverK: 4000,
        gainStability: 0,
        requiredNedtK: 6.0,
        ifFilter: "slot",
        centreToleranceMHz: null,
      },
    ],
  };
}
