import type { FieldGroup } from "../entity-form";
import { chainNoiseGroups } from "./noise";
import type { RefOption } from "../entity-specs";

/** The form fields and new-entity defaults of a receiver chain. */

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
    {
      legend: "Operating envelope",
      fields: [
        {
          name: "temperatureExcursionK",
          label: "Resonator temperature excursion",
          unit: "± K, 0 to 50",
          kind: "number",
          help: "How far the resonator temperature may wander about its set point while observing. With the laser drift it sets the envelope every verdict must hold over.",
        },
      ],
    },
    ...chainNoiseGroups(),
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
  temperatureExcursionK: 0,
};
