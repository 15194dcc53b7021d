import type { FieldGroup } from "../entity-form";
import { channelNoiseFields } from "./noise";
import type { RefOption } from "../entity-specs";

/** The form fields and new-entity defaults of a channel. */

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
        ...channelNoiseFields(),
      ],
    },
    {
      legend: "Operating envelope",
      fields: [
        {
          name: "ifFilter",
          label: "IF filter",
          unit: "slot or occupied band",
          kind: "select",
          options: [
            { value: "slot", label: "nominal slot" },
            { value: "occupied", label: "occupied band (slot ± drift)" },
          ],
          help: "A slot filter lets LO drift slide the received band off the mode; an occupied-band filter is wider by the drift on each side, so drift moves the IF inside it instead.",
        },
        {
          name: "centreToleranceMHz",
          label: "Centre tolerance",
          unit: "MHz; empty = none",
          kind: "number",
          placeholder: "no tolerance",
          help: "Largest allowed error of the effective centre frequency over the envelope (centre-drift).",
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
  ifFilter: "slot",
  centreToleranceMHz: null,
};
