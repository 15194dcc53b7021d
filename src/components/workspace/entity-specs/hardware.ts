import type { FieldGroup } from "../entity-form";
import { detectorNoiseGroups, laserNoiseGroups, resonatorNoiseGroups } from "./noise";

/** The form fields and new-entity defaults of the hardware: laser pairs, resonators and detectors. */

export function laserGroups(): FieldGroup[] {
  return [
    {
      legend: "Laser pair",
      fields: [
        {
          name: "key",
          label: "Plan id",
          unit: "text, e.g. LP1",
          kind: "text",
          help: "How chains and the plan document name this laser pair.",
        },
        {
          name: "carrierTHz",
          label: "Carrier frequency",
          unit: "THz",
          kind: "number",
          help: "Laser 1, locked to a resonator mode.",
          helper: "wavelength",
        },
        {
          name: "carrierPowerMW",
          label: "Carrier power",
          unit: "mW",
          kind: "number",
          help: "Launched into the resonator coupler.",
          caution: "laser",
        },
        {
          name: "loPowerMW",
          label: "LO power",
          unit: "mW",
          kind: "number",
          help: "Laser 2 at the detector's LO port.",
          caution: "laser",
        },
        {
          name: "stepMHz",
          label: "Tuning step",
          unit: "MHz",
          kind: "number",
          help: "Granularity of the LO offset; 0 means any offset.",
        },
        {
          name: "driftMHz",
          label: "Drift",
          unit: "± MHz",
          kind: "number",
          help: "Worst-case excursion of the LO offset relative to the carrier while observing.",
          helper: "drift",
        },
        {
          name: "reach",
          label: "Reachable LO offsets",
          unit: "GHz, signed offsets from the carrier",
          kind: "intervals",
          newInterval: { minGHz: 150, maxGHz: 200 },
          help: "Where laser 2 can be set. Overlapping or touching intervals are merged before any check. Upload a measured tuning map to replace these.",
        },
      ],
    },
    {
      legend: "PDH lock",
      fields: [
        {
          name: "lock.modulationMHz",
          label: "Modulation frequency",
          unit: "MHz",
          kind: "number",
          help: "Phase-modulation frequency of the lock.",
        },
        {
          name: "lock.modulationIndex",
          label: "Modulation index β",
          unit: "rad, below 2.4",
          kind: "number",
          help: "Must stay below the first zero of J₀ (2.405).",
        },
        {
          name: "lock.orders",
          label: "Sideband orders",
          unit: "count, ≥ 1",
          kind: "number",
          step: "1",
          help: "How many lock sideband orders to follow in the spur and replica checks.",
        },
      ],
    },
    ...laserNoiseGroups(),
  ];
}

export const laserDefaults = {
  key: "LP1",
  carrierTHz: 193.4,
  carrierPowerMW: 10,
  loPowerMW: 2,
  reach: [{ minGHz: 150, maxGHz: 200 }],
  stepMHz: 10,
  driftMHz: 20,
  lock: { modulationMHz: 60, modulationIndex: 0.5, orders: 2 },
};

export function resonatorGroups(): FieldGroup[] {
  return [
    {
      legend: "Resonator",
      fields: [
        { name: "key", label: "Plan id", unit: "text, e.g. R1", kind: "text" },
        {
          name: "fsrGHz",
          label: "Free spectral range",
          unit: "GHz",
          kind: "number",
          help: "Mode n sits at n × FSR from the carrier.",
          helper: "resonator",
        },
        {
          name: "loadedQ",
          label: "Loaded Q",
          unit: "dimensionless",
          kind: "number",
          help: "Sets the mode linewidth: carrier frequency / Q (1e7 at 193.4 THz gives 19.3 MHz).",
          helper: "resonator",
        },
        {
          name: "fsrShiftMHzPerK",
          label: "FSR shift per kelvin",
          unit: "MHz/K, signed; 0 = none",
          kind: "number",
          help: "How the FSR moves with the resonator temperature (about −6.3 MHz/K for a LiNbO3 disc at 183 GHz). The sizing helper computes it for the mode pair.",
          helper: "fsr-shift",
        },
      ],
    },
    ...resonatorNoiseGroups(),
  ];
}

export const resonatorDefaults = { key: "R1", fsrGHz: 183.31, loadedQ: 1e7, fsrShiftMHzPerK: 0 };

export function detectorGroups(): FieldGroup[] {
  return [
    {
      legend: "Balanced detector and IF chain",
      fields: [
        { name: "key", label: "Plan id", unit: "text, e.g. D1", kind: "text", wide: true },
        {
          name: "minGHz",
          label: "Usable IF band from",
          unit: "GHz",
          kind: "number",
          help: "0 for a DC-coupled detector.",
        },
        { name: "maxGHz", label: "Usable IF band to", unit: "GHz", kind: "number" },
        {
          name: "maxInputMW",
          label: "Max input per photodiode",
          unit: "mW",
          kind: "number",
          caution: "laser",
        },
        {
          name: "sampleRateGHz",
          label: "Sample rate",
          unit: "GS/s in GHz; empty when not digitised directly",
          kind: "number",
          placeholder: "not digitised",
          help: "Set when the IF is sampled directly; enables the Nyquist checks.",
        },
      ],
    },
    ...detectorNoiseGroups(),
  ];
}

export const detectorDefaults = { key: "D1", minGHz: 0.05, maxGHz: 6, maxInputMW: 5, sampleRateGHz: null };
