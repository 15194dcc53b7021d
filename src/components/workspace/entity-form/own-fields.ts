/**
 * Only the form's own fields (and conform's intent): a helper opened beside a
 * field has inputs of its own inside this form, which the strict schemas
 * would refuse as unknown keys.
 */
export function ownFields(formData: FormData, names: readonly string[]): FormData {
  const roots = new Set(names.map((n) => n.split(/[.[]/)[0]));
  const out = new FormData();
  for (const [k, v] of formData.entries()) {
    if (k.startsWith("__") || roots.has(k.split(/[.[]/)[0])) out.append(k, v);
  }
  return out;
}
