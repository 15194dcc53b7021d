import type { ChannelParseError, ChannelParseResult, ChannelPart, ChannelSpec } from "./internals/channel";

export type { ChannelParseError, ChannelParseResult, ChannelPart, ChannelSpec };

const NUMBER = String.raw`(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?`;
const QUANTITY = new RegExp(String.raw`^(${NUMBER})\s*([a-zA-Z]+)?$`);
const BANDWIDTH = new RegExp(String.raw`^(?:(${NUMBER})\s*[×xX*]\s*)?(${NUMBER})\s*([a-zA-Z]+)?$`);

const FREQUENCY_UNITS: Record<string, number> = { thz: 1000, ghz: 1, mhz: 1e-3 };
const BANDWIDTH_UNITS: Record<string, number> = { ghz: 1000, mhz: 1, khz: 1e-3 };

function fail(part: ChannelPart, text: string, message: string): { ok: false; error: ChannelParseError } {
  return { ok: false, error: { part, text, message } };
}

interface Quantity {
  value: number;
  /** multiplier to GHz, or null when no unit was written */
  scale: number | null;
}

function readFrequency(text: string): Quantity | string {
  const m = QUANTITY.exec(text);
  if (!m) return `“${text}” is not a frequency (expected a number, optionally followed by GHz, MHz or THz)`;
  const unit = m[2];
  if (unit === undefined) return { value: Number(m[1]), scale: null };
  const scale = FREQUENCY_UNITS[unit.toLowerCase()];
  if (scale === undefined) return `unknown unit “${unit}” (use GHz, MHz or THz)`;
  return { value: Number(m[1]), scale };
}

type Bandwidth = { perSideband: boolean; mhz: number };

function readBandwidth(text: string): Bandwidth | string {
  const m = BANDWIDTH.exec(text);
  if (!m) return `“${text}” is not a bandwidth (expected e.g. “500 MHz” or “2 × 500 MHz”)`;
  const factor = m[1];
  if (factor !== undefined && Number(factor) !== 2) {
    return `only the per-sideband form “2 × b” is understood, not “${factor} ×”`;
  }
  const unit = m[3];
  if (unit === undefined) return `“${text}” needs a unit (MHz, GHz or kHz)`;
  const scale = BANDWIDTH_UNITS[unit.toLowerCase()];
  if (scale === undefined) return `unknown unit “${unit}” (use MHz, GHz or kHz)`;
  return { perSideband: factor !== undefined, mhz: Number(m[2]) * scale };
}

export interface ParseChannelOptions {
  /**
   * Bandwidth to use when the notation itself has none: a number in MHz or a
   * text such as "2 x 500 MHz". A bandwidth written in the notation wins.
   */
  bandwidth?: number | string | null;
}

/**
 * Parse the channel notation of microwave sounder tables into the plan's
 * channel fields (as in the channel tables of the MHS instrument description,
 * AMSU-B and the EUMETSAT ICI):
 *
 * - "183.31 ± 7.0" (also "+/-", "+-", "± 7.0 GHz"): double-sideband c ± d;
 * - "183.311 ± 3.00 GHz, 2 × 1000 MHz": with the bandwidth per sideband
 *   ("2 × b", also "2 x b"); a bare "b MHz" on a double-sideband channel is
 *   also read as the width of each passband;
 * - "89.0" or "89.0 GHz, 2800 MHz": a single passband.
 *
 * Frequencies default to GHz. A unit written once (at the end) applies to the
 * centre and the offset. Quadruple-sideband channels "f0 ± d1 ± d2" are
 * refused: they are not in model v1.
 */
export function parseChannelNotation(notation: string, options: ParseChannelOptions = {}): ChannelParseResult {
  if (typeof notation !== "string" || notation.trim() === "") {
    return fail("notation", "", "enter a channel, e.g. “183.31 ± 7.0 GHz, 2 × 500 MHz” or “89.0 GHz, 2800 MHz”");
  }
  const text = notation.replace(/\+\s*\/\s*-|\+\s*-/g, "±").trim();
  const sep = text.search(/[,;]/);
  const main = (sep === -1 ? text : text.slice(0, sep)).trim();
  const bandwidthText = sep === -1 ? null : text.slice(sep + 1).trim();

  const pieces = main.split("±").map((p) => p.trim());
  if (pieces.length > 2) {
    return fail(
      "notation",
      main,
      "quadruple-sideband channels (f0 ± d1 ± d2) are not in model v1; enter each double-sideband pair as its own channel",
    );
  }
  const centreText = pieces[0] ?? "";
  if (centreText === "") return fail("centre", centreText, "the centre frequency is missing");
  const centre = readFrequency(centreText);
  if (typeof centre === "string") return fail("centre", centreText, centre);

  let offset: Quantity | null = null;
  const offsetText = pieces[1];
  if (offsetText !== undefined) {
    if (offsetText === "") return fail("offset", offsetText, "the sideband offset after “±” is missing");
    const read = readFrequency(offsetText);
    if (typeof read === "string") return fail("offset", offsetText, read);
    offset = read;
  }

  // A unit written once applies to both numbers; none at all means GHz.
  const centreScale = centre.scale ?? offset?.scale ?? 1;
  const centerGHz = centre.value * centreScale;
  const dsbOffsetGHz = offset === null ? null : offset.value * (offset.scale ?? centre.scale ?? 1);

  let bandwidth: Bandwidth;
  let bwPart: string;
  if (bandwidthText !== null) {
    bwPart = bandwidthText;
    if (bandwidthText === "") return fail("bandwidth", bandwidthText, "the bandwidth after the comma is missing");
    const read = readBandwidth(bandwidthText);
    if (typeof read === "string") return fail("bandwidth", bandwidthText, read);
    bandwidth = read;
  } else if (typeof options.bandwidth === "number") {
    bwPart = String(options.bandwidth);
    if (!Number.isFinite(options.bandwidth))
      return fail("bandwidth", bwPart, "the bandwidth must be a finite number of MHz");
    bandwidth = { perSideband: false, mhz: options.bandwidth };
  } else if (typeof options.bandwidth === "string" && options.bandwidth.trim() !== "") {
    bwPart = options.bandwidth.trim();
    const read = readBandwidth(bwPart);
    if (typeof read === "string") return fail("bandwidth", bwPart, read);
    bandwidth = read;
  } else {
    return fail(
      "bandwidth",
      "",
      "no bandwidth given: add it after a comma (e.g. “, 2 × 500 MHz”) or enter it separately",
    );
  }

  if (!(centerGHz > 0) || !Number.isFinite(centerGHz)) {
    return fail("centre", centreText, "the centre frequency must be greater than 0");
  }
  if (dsbOffsetGHz !== null && (!(dsbOffsetGHz > 0) || !Number.isFinite(dsbOffsetGHz))) {
    return fail("offset", offsetText ?? "", "the sideband offset must be greater than 0");
  }
  if (!(bandwidth.mhz > 0) || !Number.isFinite(bandwidth.mhz)) {
    return fail("bandwidth", bwPart, "the bandwidth must be greater than 0");
  }
  if (bandwidth.perSideband && dsbOffsetGHz === null) {
    return fail(
      "bandwidth",
      bwPart,
      "“2 × b” gives a bandwidth per sideband and needs a double-sideband channel (centre ± offset)",
    );
  }
  const halfGHz = bandwidth.mhz / 2000;
  if (dsbOffsetGHz !== null) {
    if (!(dsbOffsetGHz > halfGHz)) {
      return fail(
        "offset",
        offsetText ?? "",
        `the offset must exceed half the bandwidth (${halfGHz} GHz) so the two passbands do not overlap`,
      );
    }
    if (!(centerGHz - dsbOffsetGHz - halfGHz > 0)) {
      return fail("offset", offsetText ?? "", "the lower passband would reach 0 GHz");
    }
  } else if (!(centerGHz - halfGHz > 0)) {
    return fail("bandwidth", bwPart, "the passband would reach 0 GHz");
  }
  return { ok: true, value: { centerGHz, dsbOffsetGHz, bandwidthMHz: bandwidth.mhz } };
}
