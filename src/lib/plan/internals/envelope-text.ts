import type { BoxPoint, EnvelopeBox } from "./envelope-box";
import { isPointBox } from "./envelope-box";
import { fMHz } from "./format";

/** A signed number for messages: "+20", "−0.5" (U+2212 minus), "0". */
function signed(v: string): string {
  if (v === "0") return v;
  return v.startsWith("-") ? `\u2212${v.slice(1)}` : `+${v}`;
}

/** A temperature offset in K to 1 mK, signed. */
export const fOffsetK = (t: number) => signed(String(Math.round(t * 1000) / 1000 + 0));

/**
 * Where in the operating envelope a worst value occurs, for messages:
 * "at an LO shift of +20 MHz and a resonator temperature offset of −0.5 K";
 * the temperature is left out when the box holds only the nominal one.
 */
export function whereText(box: EnvelopeBox, at: BoxPoint): string {
  const lo = `an LO shift of ${signed(fMHz(at.u))} MHz`;
  if (box.k === 0 && box.phi === 0) return `at ${lo}`;
  if (box.tLo === 0 && box.tHi === 0) return `at ${lo}`;
  return `at ${lo} and a resonator temperature offset of ${fOffsetK(at.t)} K`;
}

/** The operating envelope is more than the nominal point (so messages say where a worst value occurs). */
export const hasEnvelope = (box: EnvelopeBox): boolean => !isPointBox(box);
