import type { FieldGroup } from "../entity-form";

/** The form fields of the check settings. */

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
