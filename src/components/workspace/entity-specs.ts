import type { FieldGroup } from "./entity-form";

/**
 * The fields of every workspace form: label, unit, help text and, for a new
 * entity, a sensible default (the example values of plan-format.md, which
 * describe a 183 GHz water-vapour channel on a 193.4 THz carrier).
 */

export interface RefOption {
  value: string;
  label: string;
}

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
      ],
    },
  ];
}

export const resonatorDefaults = { key: "R1", fsrGHz: 183.31, loadedQ: 1e7 };

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
          label: "Maximum optical input per photodiode",
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
  ];
}

export const detectorDefaults = { key: "D1", minGHz: 0.05, maxGHz: 6, maxInputMW: 5, sampleRateGHz: null };

export function chainGroups(refs: {
  lasers: RefOption[];
  resonators: RefOption[];
  detectors: RefOption[];
}): FieldGroup[] {
  return [
    {
      legend: "Receiver chain",
      fields: [
        { name: "key", label: "Plan id", unit: "text, e.g. A", kind: "text" },
        {
          name: "sideband",
          label: "Sideband",
          unit: "upper or lower",
          kind: "select",
          options: [
            { value: "upper", label: "upper (+)" },
            { value: "lower", label: "lower (−)" },
          ],
        },
        {
          name: "laserId",
          label: "Laser pair",
          unit: "one chain per laser pair",
          kind: "select",
          options: refs.lasers,
        },
        { name: "resonatorId", label: "Resonator", unit: "reference", kind: "select", options: refs.resonators },
        { name: "detectorId", label: "Detector", unit: "reference", kind: "select", options: refs.detectors },
        {
          name: "mode",
          label: "Mode number k",
          unit: "integer ≥ 1",
          kind: "number",
          step: "1",
          help: "The wanted sideband sits in resonator mode ±k.",
        },
        {
          name: "loOffsetGHz",
          label: "LO offset",
          unit: "GHz, signed",
          kind: "number",
          help: "Laser 2 minus the carrier. The feasibility map shows where it may go.",
        },
        {
          name: "rfInput.minGHz",
          label: "RF input from",
          unit: "GHz",
          kind: "number",
          help: "Antenna/feed passband (ideal box).",
        },
        { name: "rfInput.maxGHz", label: "RF input to", unit: "GHz", kind: "number" },
      ],
    },
    {
      legend: "Optical path",
      fields: [
        {
          name: "tapFraction",
          label: "Lock tap fraction",
          unit: "0 to below 1",
          kind: "number",
          help: "Share of the resonator output sent to the lock.",
        },
        {
          name: "pathLossDB",
          label: "Path loss",
          unit: "dB",
          kind: "number",
          help: "From resonator output to the detector.",
        },
        {
          name: "carrierRejectionDB",
          label: "Carrier notch",
          unit: "dB",
          kind: "number",
          help: "Optional optical notch on the carrier; 0 when there is none.",
        },
        {
          name: "sharedIf",
          label: "Shared IF (filter bank)",
          unit: "yes/no",
          kind: "checkbox",
          help: "Channels are cut from one IF and may overlap; overlaps become warnings.",
        },
      ],
    },
  ];
}

export const chainDefaults = {
  key: "A",
  sideband: "upper",
  mode: 1,
  loOffsetGHz: 184.81,
  rfInput: { minGHz: 175, maxGHz: 195 },
  tapFraction: 0.01,
  pathLossDB: 3,
  carrierRejectionDB: 0,
  sharedIf: false,
};

export function channelGroups(refs: { chains: RefOption[] }): FieldGroup[] {
  return [
    {
      legend: "Channel",
      fields: [
        { name: "key", label: "Plan id", unit: "text, e.g. wv1", kind: "text" },
        { name: "chainId", label: "Receiver chain", unit: "reference", kind: "select", options: refs.chains },
        {
          name: "name",
          label: "Name",
          unit: "text",
          kind: "text",
          wide: true,
          help: "For people, e.g. “183.31 line centre”.",
        },
        {
          name: "centerGHz",
          label: "Centre frequency",
          unit: "GHz",
          kind: "number",
          help: "Or enter the channel as written in sounder tables (183.31 ± 7.0, 2 × 500 MHz) with the notation helper.",
          helper: "notation",
        },
        { name: "bandwidthMHz", label: "Bandwidth", unit: "MHz", kind: "number", help: "Width of one passband." },
        {
          name: "dsbOffsetGHz",
          label: "DSB offset",
          unit: "GHz; empty for SSB",
          kind: "number",
          placeholder: "single sideband",
          help: "For a double-sideband channel at centre ± offset; more than half the bandwidth.",
        },
        { name: "integrationMs", label: "Integration time", unit: "ms", kind: "number" },
      ],
    },
    {
      legend: "Sensitivity",
      fields: [
        { name: "antennaK", label: "Antenna temperature", unit: "K", kind: "number" },
        {
          name: "receiverK",
          label: "Receiver noise",
          unit: "K, SSB-referred at the mode peak",
          kind: "number",
          helper: "receiver",
        },
        { name: "gainStability", label: "Gain stability ΔG/G", unit: "fraction; 0 = ideal", kind: "number" },
        {
          name: "requiredNedtK",
          label: "Required NEΔT",
          unit: "K; empty = no requirement",
          kind: "number",
          placeholder: "no requirement",
        },
      ],
    },
  ];
}

export const channelDefaults = {
  key: "",
  name: "",
  centerGHz: 183.31,
  bandwidthMHz: 10,
  dsbOffsetGHz: null,
  integrationMs: 10,
  antennaK: 250,
  receiverK: 5000,
  gainStability: 0,
  requiredNedtK: null,
};

export function settingsGroups(): FieldGroup[] {
  return [
    {
      legend: "Check settings",
      fields: [
        {
          name: "guardMHz",
          label: "Guard band",
          unit: "MHz",
          kind: "number",
          help: "Minimum gap between an occupied IF band and anything that hits it.",
        },
        {
          name: "imageRejectionDB",
          label: "Required image rejection",
          unit: "dB",
          kind: "number",
          help: "Less rejection than this is an error.",
        },
        {
          name: "spurMaxOrder",
          label: "Highest spur order",
          unit: "integer 2–9",
          kind: "number",
          step: "1",
          help: "For harmonics and intermodulation.",
        },
        {
          name: "replicaLimitDB",
          label: "Lock replica limit",
          unit: "dB",
          kind: "number",
          help: "A lock-sideband replica share above this is a warning.",
        },
      ],
    },
  ];
}

/** A stored row as form values: strips bookkeeping fields the strict schemas refuse. */
export function rowToFormValue(row: Record<string, unknown>): Record<string, unknown> {
  const { id: _i, version: _v, createdAt: _c, updatedAt: _u, missionId: _m, revision: _r, ...rest } = row;
  return rest;
}

/** The first of `preferred` not yet used, else prefix + the lowest free number (new plan ids). */
export function nextKey(used: readonly string[], prefix: string, preferred: readonly string[] = []): string {
  const taken = new Set(used);
  for (const p of preferred) if (!taken.has(p)) return p;
  for (let i = 1; ; i++) if (!taken.has(`${prefix}${i}`)) return `${prefix}${i}`;
}
