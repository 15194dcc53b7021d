/** One band in which the Radio Regulations prohibit all emissions. */
export interface ProtectedBand {
  bandGHz: readonly [number, number];
  /** Where the entry comes from, for people. */
  source: string;
  /**
   * True when the edges are written from memory of the regulation and are
   * still to be checked against the text of its current edition (every RR
   * No. 5.340 band below is).
   */
  fromMemory: boolean;
}

const RR_5_340 =
  "ITU Radio Regulations, Article 5, No. 5.340 (all emissions are prohibited); band edges to be checked against the current edition of the Radio Regulations";

/**
 * Bands at or near 100–350 GHz listed in RR No. 5.340. The 182–185 GHz band
 * carries a specific exception in the regulation that is not modelled here.
 * Cross-check: the neighbouring shared bands of RR No. 5.149 (WRC-07 text)
 * abut these edges.
 */
export const PROTECTED_BANDS: readonly ProtectedBand[] = [
  { bandGHz: [86, 92], source: RR_5_340, fromMemory: true },
  { bandGHz: [100, 102], source: RR_5_340, fromMemory: true },
  { bandGHz: [109.5, 111.8], source: RR_5_340, fromMemory: true },
  { bandGHz: [114.25, 116], source: RR_5_340, fromMemory: true },
  { bandGHz: [148.5, 151.5], source: RR_5_340, fromMemory: true },
  { bandGHz: [164, 167], source: RR_5_340, fromMemory: true },
  {
    bandGHz: [182, 185],
    source: `${RR_5_340}; the regulation makes a specific exception in this band`,
    fromMemory: true,
  },
  { bandGHz: [190, 191.8], source: RR_5_340, fromMemory: true },
  { bandGHz: [200, 209], source: RR_5_340, fromMemory: true },
  { bandGHz: [226, 231.5], source: RR_5_340, fromMemory: true },
  { bandGHz: [250, 252], source: RR_5_340, fromMemory: true },
];

/**
 * The protected band that wholly holds the passband (edges included, with
 * the 1e-9 GHz allowance), or null.
 */
export function protectedBandHolding(passband: readonly [number, number]): ProtectedBand | null {
  for (const band of PROTECTED_BANDS) {
    if (passband[0] >= band.bandGHz[0] - 1e-9 && passband[1] <= band.bandGHz[1] + 1e-9) return band;
  }
  return null;
}
