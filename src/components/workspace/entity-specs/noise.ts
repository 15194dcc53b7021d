import type { FieldGroup } from "../entity-form";

/**
 * The form fields of the noise budget (docs/plan-format.md §14.1): one
 * optional group per entity, appended to its form. An empty field is "not
 * given"; with a conversion efficiency the channel gets its noise budget.
 */

const optional = "empty = not given";

export function laserNoiseGroups(): FieldGroup[] {
  return [
    {
      legend: "Laser noise (optional, for the noise budget)",
      fields: [
        {
          name: "carrierRinDBcPerHz",
          label: "Carrier RIN",
          unit: "dBc/Hz at the IF offsets",
          kind: "number",
          placeholder: optional,
        },
        {
          name: "loRinDBcPerHz",
          label: "LO RIN",
          unit: "dBc/Hz at the IF offsets",
          kind: "number",
          placeholder: optional,
        },
        {
          name: "carrierFloorDBcPerHz",
          label: "Carrier broadband floor",
          unit: "dBc/Hz at the signal's offset",
          kind: "number",
          placeholder: optional,
          help: "The ASE-like floor of the carrier laser about one RF frequency away from it, where the signal is.",
        },
        {
          name: "loFloorDBcPerHz",
          label: "LO broadband floor",
          unit: "dBc/Hz at the carrier's offset",
          kind: "number",
          placeholder: optional,
          help: "The floor of the LO laser about one LO offset away from it, where the residual carrier is.",
        },
        { name: "carrierPreFilterDB", label: "Carrier pre-filter", unit: "dB of floor rejection", kind: "number" },
        { name: "loPreFilterDB", label: "LO pre-filter", unit: "dB of floor rejection", kind: "number" },
      ],
    },
  ];
}

export function resonatorNoiseGroups(): FieldGroup[] {
  return [
    {
      legend: "Coupling and conversion (optional, for the noise budget)",
      fields: [
        {
          name: "intrinsicQ",
          label: "Intrinsic Q",
          unit: "dimensionless, above the loaded Q",
          kind: "number",
          placeholder: optional,
          help: "With the loaded Q it fixes the coupling and the carrier left in the through port.",
        },
        {
          name: "conversionEfficiency",
          label: "Photon conversion efficiency η",
          unit: "0 < η ≤ 1, measured",
          kind: "number",
          placeholder: "computed from g₀ if empty",
        },
        { name: "g0Hz", label: "Coupling rate g₀/2π", unit: "Hz", kind: "number", placeholder: optional },
        { name: "mmWaveQ", label: "mm-wave mode Q", unit: "dimensionless", kind: "number", placeholder: optional },
        {
          name: "mmWaveCouplingRatio",
          label: "mm-wave coupling share",
          unit: "κ_ex/κ, 0 to 1",
          kind: "number",
          placeholder: optional,
        },
      ],
    },
  ];
}

export function detectorNoiseGroups(): FieldGroup[] {
  return [
    {
      legend: "Detector noise (optional, for the noise budget)",
      fields: [
        { name: "responsivityAPerW", label: "Responsivity", unit: "A/W", kind: "number", placeholder: optional },
        {
          name: "quantumEfficiency",
          label: "Quantum efficiency",
          unit: "0 to 1",
          kind: "number",
          placeholder: "from the responsivity",
        },
        {
          name: "noiseCurrentPAPerRtHz",
          label: "Input current noise",
          unit: "pA/√Hz",
          kind: "number",
          placeholder: optional,
        },
        { name: "cmrrDB", label: "Common-mode rejection", unit: "dB", kind: "number", placeholder: optional },
      ],
    },
  ];
}

export function chainNoiseGroups(): FieldGroup[] {
  return [
    {
      legend: "Front end (for the noise budget)",
      fields: [
        {
          name: "frontEndLossDB",
          label: "Front-end loss",
          unit: "dB, antenna to resonator",
          kind: "number",
        },
        { name: "frontEndTemperatureK", label: "Its physical temperature", unit: "K", kind: "number" },
      ],
    },
  ];
}

export function channelNoiseFields(): FieldGroup["fields"] {
  return [
    {
      name: "receiverKSource",
      label: "Receiver noise used in NEΔT",
      unit: "entered or computed",
      kind: "select",
      options: [
        { value: "entered", label: "as entered (measured)" },
        { value: "computed", label: "computed noise budget" },
      ],
      help: "Computed needs the resonator's conversion efficiency (or g₀, the mm-wave mode and the intrinsic Q).",
    },
  ];
}
