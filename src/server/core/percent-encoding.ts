/**
 * Request targets whose percent-encoding is not UTF-8 (`/api/team/members/%FF`,
 * `?chain=%FF`). Next.js answers such a path with a bare 500 and turns such
 * a query value into U+FFFD before the app sees it. The request hook
 * (request-hook.ts) therefore escapes each such run (`%FF` → `%25FF`, so it
 * reads literally and harms nothing) and records where it was in
 * NOT_UTF8_HEADER; the route guard answers 400 `invalid-encoding` naming
 * it. RFC 3986 §2.5: percent-encoded octets of a URI component are read
 * as UTF-8 here, so other bytes are an error, not something to guess at.
 *
 * Free of `server-only`: instrumentation.ts loads it outside the React
 * server layer.
 */

/** Where a request target's percent-encoding was not UTF-8: `path`, or `query:NAME` for each parameter. */
export const NOT_UTF8_HEADER = "x-heterolane-not-utf8";

const RUN = /(?:%[0-9A-Fa-f]{2})+/g;

function decodes(run: string): boolean {
  try {
    decodeURIComponent(run);
    return true;
  } catch {
    return false;
  }
}

/** The part with every run of percent-escapes that is not UTF-8 escaped again, and whether there was one. */
function escapePart(part: string): { text: string; bad: boolean } {
  let bad = false;
  const text = part.replace(RUN, (run) => {
    if (decodes(run)) return run;
    bad = true;
    return run.replace(/%/g, "%25");
  });
  return { text, bad };
}

/** The request target made safe, and where it was not UTF-8 (empty when it was fine). */
export function escapeNonUtf8(target: string): { target: string; places: string[] } {
  const q = target.indexOf("?");
  const path = q < 0 ? target : target.slice(0, q);
  const query = q < 0 ? null : target.slice(q + 1);
  const places: string[] = [];
  const p = escapePart(path);
  if (p.bad) places.push("path");
  let outQuery = query;
  if (query !== null) {
    outQuery = query
      .split("&")
      .map((pair) => {
        const eq = pair.indexOf("=");
        const key = eq < 0 ? pair : pair.slice(0, eq);
        const k = escapePart(key);
        const v = escapePart(eq < 0 ? "" : pair.slice(eq + 1));
        if (k.bad || v.bad) {
          let name = k.text;
          try {
            name = decodeURIComponent(k.text.replace(/\+/g, " "));
          } catch {
            // keep the escaped text
          }
          places.push(`query:${encodeURIComponent(name.slice(0, 40))}`);
        }
        return eq < 0 ? k.text : `${k.text}=${v.text}`;
      })
      .join("&");
  }
  return { target: outQuery === null ? p.text : `${p.text}?${outQuery}`, places };
}

/** The places recorded by the hook, as issues of a 400 answer. */
export function notUtf8Issues(headerValue: string | null): { path: string; message: string }[] {
  if (!headerValue) return [];
  return headerValue.split(",").map((place) => ({
    path: place.startsWith("query:") ? decodeURIComponent(place.slice(6)) : "",
    message:
      place === "path" ? "the address is not valid UTF-8 (percent-encoding)" : "is not valid UTF-8 (percent-encoding)",
  }));
}
