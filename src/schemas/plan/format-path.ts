/** A path into the document: object keys and array indices. */
export type PathSegment = string | number;

/** `channels[2].bandwidthMHz`; keys that are not plain names are quoted: `a["x y"]`. */
export function formatPath(path: readonly PropertyKey[]): string {
  let s = "";
  for (const seg of path) {
    if (typeof seg === "number") s += `[${seg}]`;
    else {
      const key = String(seg);
      if (/^[A-Za-z_$][A-Za-z0-9_$]*$/.test(key)) s += s === "" ? key : `.${key}`;
      else s += `[${JSON.stringify(key)}]`;
    }
  }
  return s;
}
