import type { HelperKind } from "../field-helper";

export type FieldSpec = {
  name: string;
  label: string;
  /** Shown in the label: "(GHz)". Every field names its unit, or what it counts. */
  unit: string;
  help?: string;
  /** Laser-safety caution beside optical power fields. */
  caution?: "laser";
  wide?: boolean;
  /** A helper calculation opened beside the field; its Apply fills the form. */
  helper?: HelperKind;
} & (
  | { kind: "number"; step?: string; placeholder?: string }
  | { kind: "text"; placeholder?: string }
  | { kind: "textarea" }
  | { kind: "select"; options: { value: string; label: string }[] }
  | { kind: "checkbox" }
  | { kind: "intervals"; newInterval: { minGHz: number; maxGHz: number } }
);

export interface FieldGroup {
  legend: string;
  fields: FieldSpec[];
}

/** Every leaf name of the specs, as conform names them (used to place server issues). */
export function fieldNames(groups: readonly FieldGroup[]): string[] {
  return groups.flatMap((g) => g.fields.map((f) => f.name));
}
